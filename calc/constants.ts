// Physical constants and solver settings of the boost model (calc/README.md). SI throughout.

/** Ratio of specific heats of dry air, γ (dimensionless). */
export const GAMMA = 1.4;
/** κ = (γ − 1)/γ, the isentropic exponent of temperature on pressure (dimensionless). */
export const KAPPA = (GAMMA - 1) / GAMMA;
/** Specific gas constant of dry air used by the model, R (J/(kg·K)). */
export const GAS_CONSTANT = 287.05;
/** Specific heat of air at constant pressure, cp = R/κ (J/(kg·K)). */
export const SPECIFIC_HEAT_CP = GAS_CONSTANT / KAPPA;

/** Inlet pressure at which a blower's reference volumetric efficiency is quoted (Pa). */
export const SLIP_REFERENCE_INLET_PRESSURE = 101_325;
/** Pressure ratio at which a blower's reference volumetric efficiency is quoted (dimensionless). */
export const SLIP_REFERENCE_PRESSURE_RATIO = 1.5;

/** Latent heat of vaporisation of gasoline, about 350 kJ/kg from memory (J/kg). */
export const GASOLINE_LATENT_HEAT = 350e3;
/** Density of gasoline used for cc/min conversions, about 0.74 kg/L from memory (kg/L). */
export const GASOLINE_DENSITY_KG_PER_L = 0.74;

/** Relative tolerance on the pressure ratio (and on pulley diameters) of every solve, tighter than the 1e-10 the contract asks (dimensionless). */
export const SOLVER_RELATIVE_TOLERANCE = 1e-12;
/** Iteration limit of the bracketed root finder before it reports non-convergence (count). */
export const SOLVER_MAX_ITERATIONS = 200;
/** Highest pressure ratio the solver searches when slip sets no dead-head limit (dimensionless). */
export const PRESSURE_RATIO_CEILING = 50;
/** Lowest manifold pressure the solver tries, as a fraction of the blower inlet pressure (dimensionless). */
export const PRESSURE_RATIO_FLOOR_MARGIN = 0.05;
/** Growth factor of the upward scan that brackets the lowest stable balance (dimensionless). */
export const BRACKET_SCAN_FACTOR = 1.15;
