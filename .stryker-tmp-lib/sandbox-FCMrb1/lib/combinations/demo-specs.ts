// @ts-nocheck
// Invented demo engines and blowers for the demo shop's own storylines: generic shapes, not taken
// from any test or product. Values are SI like calc/ (m, m³, Pa, K, kg/s, kg/J).
//
// - a 4.3 L V6 work truck on a Roots blower: a datalog, then a smaller blower pulley;
// - a 7.4 L V8 on a twin-screw: an intercooler added, then larger injectors;
// - a 5.7 L vintage V8 on a draw-through Roots under a carburettor: a cam-only change;
// - a 2.4 L four-cylinder road car on a small twin-screw: its owner moves to altitude.
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
import { BLOWER_DEMO_DEFAULTS, engineOf, type CombinationInput } from "@/calc";
const inch = 0.0254;
const litre = 0.001;
/** 0.5 lb/(hp·h) in kg/J: 0.45359237 kg / (745.6999 W · 3600 s). */
const bsfcHalf = stryMutAct_9fa48("192") ? 0.5 * 0.45359237 * (745.6999 * 3600) : (stryCov_9fa48("192"), (stryMutAct_9fa48("193") ? 0.5 / 0.45359237 : (stryCov_9fa48("193"), 0.5 * 0.45359237)) / (stryMutAct_9fa48("194") ? 745.6999 / 3600 : (stryCov_9fa48("194"), 745.6999 * 3600)));
/** lb/h of fuel in kg/s. */
const lbPerHour = stryMutAct_9fa48("195") ? () => undefined : (stryCov_9fa48("195"), (() => {
  const lbPerHour = (x: number) => stryMutAct_9fa48("196") ? x * 0.45359237 * 3600 : (stryCov_9fa48("196"), (stryMutAct_9fa48("197") ? x / 0.45359237 : (stryCov_9fa48("197"), x * 0.45359237)) / 3600);
  return lbPerHour;
})());
/** cfm in m³/s. */
const cfm = stryMutAct_9fa48("198") ? () => undefined : (stryCov_9fa48("198"), (() => {
  const cfm = (x: number) => stryMutAct_9fa48("199") ? x / 0.00047194745 : (stryCov_9fa48("199"), x * 0.00047194745);
  return cfm;
})());

// Blowers start from their kind's demo defaults (calc/defaults.ts) and state only where they differ.
const seaLevel = stryMutAct_9fa48("200") ? {} : (stryCov_9fa48("200"), {
  pressure: 101_325,
  temperature: 298.15,
  inletLoss: 1_500
});

/** Work truck: a 4.3 L V6 under a 1.6 L Roots, as it came in (3.4 in blower pulley). */
export const workTruckV6: CombinationInput = stryMutAct_9fa48("201") ? {} : (stryCov_9fa48("201"), {
  engine: engineOf(stryMutAct_9fa48("202") ? 4.3 / litre : (stryCov_9fa48("202"), 4.3 * litre), 6, 5200, stryMutAct_9fa48("203") ? [] : (stryCov_9fa48("203"), [stryMutAct_9fa48("204") ? [] : (stryCov_9fa48("204"), [1500, 0.8]), stryMutAct_9fa48("205") ? [] : (stryCov_9fa48("205"), [2500, 0.86]), stryMutAct_9fa48("206") ? [] : (stryCov_9fa48("206"), [3500, 0.88]), stryMutAct_9fa48("207") ? [] : (stryCov_9fa48("207"), [4500, 0.85]), stryMutAct_9fa48("208") ? [] : (stryCov_9fa48("208"), [5200, 0.8])])),
  blower: stryMutAct_9fa48("209") ? {} : (stryCov_9fa48("209"), {
    kind: stryMutAct_9fa48("210") ? "" : (stryCov_9fa48("210"), "roots"),
    ...BLOWER_DEMO_DEFAULTS.roots,
    displacementPerRev: stryMutAct_9fa48("211") ? 1.6 / litre : (stryCov_9fa48("211"), 1.6 * litre),
    maxRpm: 14_000,
    volumetricEfficiencyRef: 0.82,
    referenceRpm: 10_000
  }),
  drive: stryMutAct_9fa48("212") ? {} : (stryCov_9fa48("212"), {
    crankPulleyDiameter: stryMutAct_9fa48("213") ? 6.0 / inch : (stryCov_9fa48("213"), 6.0 * inch),
    blowerPulleyDiameter: stryMutAct_9fa48("214") ? 3.4 / inch : (stryCov_9fa48("214"), 3.4 * inch),
    beltSlip: 0.02
  }),
  ambient: seaLevel,
  intercooler: null,
  fuel: stryMutAct_9fa48("215") ? {} : (stryCov_9fa48("215"), {
    afr: 11.8,
    bsfc: stryMutAct_9fa48("216") ? bsfcHalf / 1.1 : (stryCov_9fa48("216"), bsfcHalf * 1.1),
    injectorCount: 6,
    injectorFlow: lbPerHour(36),
    maxDuty: 0.85,
    evaporatedBeforeBlower: 0
  })
});

/** The work truck after its datalog: a 3.0 in blower pulley to win back what the blower slips. */
export const workTruckV6SmallerPulley: CombinationInput = stryMutAct_9fa48("217") ? {} : (stryCov_9fa48("217"), {
  ...workTruckV6,
  drive: stryMutAct_9fa48("218") ? {} : (stryCov_9fa48("218"), {
    ...workTruckV6.drive,
    blowerPulleyDiameter: stryMutAct_9fa48("219") ? 3.0 / inch : (stryCov_9fa48("219"), 3.0 * inch)
  })
});

/** Big-inch V8: 7.4 L under a 2.9 L twin-screw, first without an intercooler. */
export const bigInchTwinScrew: CombinationInput = stryMutAct_9fa48("220") ? {} : (stryCov_9fa48("220"), {
  engine: engineOf(stryMutAct_9fa48("221") ? 7.4 / litre : (stryCov_9fa48("221"), 7.4 * litre), 8, 6000, stryMutAct_9fa48("222") ? [] : (stryCov_9fa48("222"), [stryMutAct_9fa48("223") ? [] : (stryCov_9fa48("223"), [2000, 0.82]), stryMutAct_9fa48("224") ? [] : (stryCov_9fa48("224"), [3000, 0.88]), stryMutAct_9fa48("225") ? [] : (stryCov_9fa48("225"), [4000, 0.91]), stryMutAct_9fa48("226") ? [] : (stryCov_9fa48("226"), [5000, 0.9]), stryMutAct_9fa48("227") ? [] : (stryCov_9fa48("227"), [6000, 0.84])])),
  blower: stryMutAct_9fa48("228") ? {} : (stryCov_9fa48("228"), {
    kind: stryMutAct_9fa48("229") ? "" : (stryCov_9fa48("229"), "twin-screw"),
    ...BLOWER_DEMO_DEFAULTS[stryMutAct_9fa48("230") ? "" : (stryCov_9fa48("230"), "twin-screw")],
    displacementPerRev: stryMutAct_9fa48("231") ? 2.9 / litre : (stryCov_9fa48("231"), 2.9 * litre),
    maxRpm: 16_000,
    internalEfficiency: 0.88
  }),
  drive: stryMutAct_9fa48("232") ? {} : (stryCov_9fa48("232"), {
    crankPulleyDiameter: stryMutAct_9fa48("233") ? 7.0 / inch : (stryCov_9fa48("233"), 7.0 * inch),
    blowerPulleyDiameter: stryMutAct_9fa48("234") ? 3.8 / inch : (stryCov_9fa48("234"), 3.8 * inch),
    beltSlip: 0.02
  }),
  ambient: seaLevel,
  intercooler: null,
  fuel: stryMutAct_9fa48("235") ? {} : (stryCov_9fa48("235"), {
    afr: 11.5,
    bsfc: stryMutAct_9fa48("236") ? bsfcHalf / 1.1 : (stryCov_9fa48("236"), bsfcHalf * 1.1),
    injectorCount: 8,
    injectorFlow: lbPerHour(42),
    maxDuty: 0.85,
    evaporatedBeforeBlower: 0
  })
});

/** The big-inch V8 with an air-to-water intercooler added. */
export const bigInchIntercooled: CombinationInput = stryMutAct_9fa48("237") ? {} : (stryCov_9fa48("237"), {
  ...bigInchTwinScrew,
  intercooler: stryMutAct_9fa48("238") ? {} : (stryCov_9fa48("238"), {
    effectiveness: 0.7,
    pressureDrop: 7_000,
    coolantTemperature: 308.15
  })
});

/** The intercooled big-inch V8 on larger injectors. */
export const bigInchLargerInjectors: CombinationInput = stryMutAct_9fa48("239") ? {} : (stryCov_9fa48("239"), {
  ...bigInchIntercooled,
  fuel: stryMutAct_9fa48("240") ? {} : (stryCov_9fa48("240"), {
    ...bigInchIntercooled.fuel,
    injectorFlow: lbPerHour(60)
  })
});

/** Vintage V8: 5.7 L with a 2.3 L Roots drawing through a carburettor, mild cam. */
export const vintageV8DrawThrough: CombinationInput = stryMutAct_9fa48("241") ? {} : (stryCov_9fa48("241"), {
  engine: engineOf(stryMutAct_9fa48("242") ? 5.7 / litre : (stryCov_9fa48("242"), 5.7 * litre), 8, 5500, stryMutAct_9fa48("243") ? [] : (stryCov_9fa48("243"), [stryMutAct_9fa48("244") ? [] : (stryCov_9fa48("244"), [1500, 0.8]), stryMutAct_9fa48("245") ? [] : (stryCov_9fa48("245"), [2500, 0.85]), stryMutAct_9fa48("246") ? [] : (stryCov_9fa48("246"), [3500, 0.86]), stryMutAct_9fa48("247") ? [] : (stryCov_9fa48("247"), [4500, 0.82]), stryMutAct_9fa48("248") ? [] : (stryCov_9fa48("248"), [5500, 0.76])])),
  blower: stryMutAct_9fa48("249") ? {} : (stryCov_9fa48("249"), {
    kind: stryMutAct_9fa48("250") ? "" : (stryCov_9fa48("250"), "roots"),
    ...BLOWER_DEMO_DEFAULTS.roots,
    displacementPerRev: stryMutAct_9fa48("251") ? 2.3 / litre : (stryCov_9fa48("251"), 2.3 * litre),
    referenceRpm: 9_000
  }),
  drive: stryMutAct_9fa48("252") ? {} : (stryCov_9fa48("252"), {
    crankPulleyDiameter: stryMutAct_9fa48("253") ? 7.0 / inch : (stryCov_9fa48("253"), 7.0 * inch),
    blowerPulleyDiameter: stryMutAct_9fa48("254") ? 3.6 / inch : (stryCov_9fa48("254"), 3.6 * inch),
    beltSlip: 0.02
  }),
  ambient: stryMutAct_9fa48("255") ? {} : (stryCov_9fa48("255"), {
    ...seaLevel,
    inletLoss: 0,
    inletRestriction: stryMutAct_9fa48("256") ? {} : (stryCov_9fa48("256"), {
      ratedFlow: cfm(1000),
      ratingDepression: 5079
    })
  }),
  intercooler: null,
  fuel: stryMutAct_9fa48("257") ? {} : (stryCov_9fa48("257"), {
    afr: 12.0,
    bsfc: stryMutAct_9fa48("258") ? bsfcHalf / 1.1 : (stryCov_9fa48("258"), bsfcHalf * 1.1),
    evaporatedBeforeBlower: 0.3,
    evaporatedInBlower: 0.5
  })
});

/** The vintage V8 after a cam-only change: it breathes better from the middle up, same pulleys. */
export const vintageV8Cam: CombinationInput = stryMutAct_9fa48("259") ? {} : (stryCov_9fa48("259"), {
  ...vintageV8DrawThrough,
  engine: stryMutAct_9fa48("260") ? {} : (stryCov_9fa48("260"), {
    ...vintageV8DrawThrough.engine,
    redlineRpm: 6000,
    veCurve: stryMutAct_9fa48("261") ? [] : (stryCov_9fa48("261"), [stryMutAct_9fa48("262") ? {} : (stryCov_9fa48("262"), {
      rpm: 1500,
      ve: 0.77
    }), stryMutAct_9fa48("263") ? {} : (stryCov_9fa48("263"), {
      rpm: 2500,
      ve: 0.84
    }), stryMutAct_9fa48("264") ? {} : (stryCov_9fa48("264"), {
      rpm: 3500,
      ve: 0.9
    }), stryMutAct_9fa48("265") ? {} : (stryCov_9fa48("265"), {
      rpm: 4500,
      ve: 0.92
    }), stryMutAct_9fa48("266") ? {} : (stryCov_9fa48("266"), {
      rpm: 5500,
      ve: 0.88
    }), stryMutAct_9fa48("267") ? {} : (stryCov_9fa48("267"), {
      rpm: 6000,
      ve: 0.84
    })])
  })
});

/** Road car: a 2.4 L four-cylinder under a 1.2 L twin-screw, at its owner's old home by the coast. */
export const roadCarFour: CombinationInput = stryMutAct_9fa48("268") ? {} : (stryCov_9fa48("268"), {
  engine: engineOf(stryMutAct_9fa48("269") ? 2.4 / litre : (stryCov_9fa48("269"), 2.4 * litre), 4, 6800, stryMutAct_9fa48("270") ? [] : (stryCov_9fa48("270"), [stryMutAct_9fa48("271") ? [] : (stryCov_9fa48("271"), [2000, 0.82]), stryMutAct_9fa48("272") ? [] : (stryCov_9fa48("272"), [3500, 0.9]), stryMutAct_9fa48("273") ? [] : (stryCov_9fa48("273"), [5000, 0.93]), stryMutAct_9fa48("274") ? [] : (stryCov_9fa48("274"), [6000, 0.9]), stryMutAct_9fa48("275") ? [] : (stryCov_9fa48("275"), [6800, 0.84])])),
  blower: stryMutAct_9fa48("276") ? {} : (stryCov_9fa48("276"), {
    kind: stryMutAct_9fa48("277") ? "" : (stryCov_9fa48("277"), "twin-screw"),
    ...BLOWER_DEMO_DEFAULTS[stryMutAct_9fa48("278") ? "" : (stryCov_9fa48("278"), "twin-screw")],
    displacementPerRev: stryMutAct_9fa48("279") ? 1.2 / litre : (stryCov_9fa48("279"), 1.2 * litre),
    builtInVolumeRatio: 1.5,
    volumetricEfficiencyRef: 0.9,
    referenceRpm: 12_000,
    internalEfficiency: 0.86
  }),
  drive: stryMutAct_9fa48("280") ? {} : (stryCov_9fa48("280"), {
    crankPulleyDiameter: stryMutAct_9fa48("281") ? 5.5 / inch : (stryCov_9fa48("281"), 5.5 * inch),
    blowerPulleyDiameter: stryMutAct_9fa48("282") ? 3.2 / inch : (stryCov_9fa48("282"), 3.2 * inch),
    beltSlip: 0.02
  }),
  ambient: stryMutAct_9fa48("283") ? {} : (stryCov_9fa48("283"), {
    pressure: 101_325,
    temperature: 293.15,
    inletLoss: 1_000
  }),
  intercooler: stryMutAct_9fa48("284") ? {} : (stryCov_9fa48("284"), {
    effectiveness: 0.65,
    pressureDrop: 5_000,
    coolantTemperature: 308.15
  }),
  fuel: stryMutAct_9fa48("285") ? {} : (stryCov_9fa48("285"), {
    afr: 12.0,
    bsfc: bsfcHalf,
    injectorCount: 4,
    injectorFlow: lbPerHour(48),
    maxDuty: 0.85,
    evaporatedBeforeBlower: 0
  })
});

/** The road car after the move to 1,600 m: 1,600 m standard atmosphere (ISO 2533), a cooler 15 °C day. */
export const roadCarFourAtAltitude: CombinationInput = stryMutAct_9fa48("286") ? {} : (stryCov_9fa48("286"), {
  ...roadCarFour,
  ambient: stryMutAct_9fa48("287") ? {} : (stryCov_9fa48("287"), {
    pressure: 83_527,
    temperature: 288.15,
    inletLoss: 1_000
  })
});