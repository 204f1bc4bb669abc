// @ts-nocheck
// The one table of a combination's fields: path, label, quantity kind and digits. The planner's
// editor, the form model, the revisions page (summary and history diff) all read it; a unit test
// checks it against calc's combinationSchema so a new calc field cannot be forgotten here.
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
import type { QuantityKind } from "@/calc";

/**
 * How a field is held and shown: a quantity in the user's units, a fraction edited as a percent,
 * a plain number (ratio), a count, a word, or the VE curve (edited as rows, see FORM_ONLY_KINDS).
 */
export type FieldQuantity = QuantityKind | "percent" | "plain" | "count" | "text" | "ve-curve";
export type SpecField = {
  /** Dotted path in the spec, as the API's field errors name it. */
  path: string;
  /** The label in the summary and the history diff. */
  label: string;
  /** The editor's label, where it words the field differently. */
  editorLabel?: string;
  quantity: FieldQuantity;
  /** Digits shown in the summary and the diff (quantities and plain numbers). */
  digits?: number;
  /** What the summary says where a spec leaves the field out (default "—"). */
  absent?: string;
  /** An optional refinement of the model (calc/README.md, "Refinements"): the editor's advanced inputs. */
  advanced?: true;
};

/** Every field of a combination people edit, in the order the summary shows them. */
export const SPEC_FIELDS: readonly SpecField[] = stryMutAct_9fa48("288") ? [] : (stryCov_9fa48("288"), [stryMutAct_9fa48("289") ? {} : (stryCov_9fa48("289"), {
  path: stryMutAct_9fa48("290") ? "" : (stryCov_9fa48("290"), "engine.displacement"),
  label: stryMutAct_9fa48("291") ? "" : (stryCov_9fa48("291"), "Engine displacement"),
  quantity: stryMutAct_9fa48("292") ? "" : (stryCov_9fa48("292"), "displacement"),
  digits: 2
}), stryMutAct_9fa48("293") ? {} : (stryCov_9fa48("293"), {
  path: stryMutAct_9fa48("294") ? "" : (stryCov_9fa48("294"), "engine.cylinders"),
  label: stryMutAct_9fa48("295") ? "" : (stryCov_9fa48("295"), "Cylinders"),
  quantity: stryMutAct_9fa48("296") ? "" : (stryCov_9fa48("296"), "count")
}), stryMutAct_9fa48("297") ? {} : (stryCov_9fa48("297"), {
  path: stryMutAct_9fa48("298") ? "" : (stryCov_9fa48("298"), "engine.redlineRpm"),
  label: stryMutAct_9fa48("299") ? "" : (stryCov_9fa48("299"), "Redline"),
  quantity: stryMutAct_9fa48("300") ? "" : (stryCov_9fa48("300"), "speed"),
  digits: 0
}), stryMutAct_9fa48("301") ? {} : (stryCov_9fa48("301"), {
  path: stryMutAct_9fa48("302") ? "" : (stryCov_9fa48("302"), "engine.veCurve"),
  label: stryMutAct_9fa48("303") ? "" : (stryCov_9fa48("303"), "Volumetric efficiency curve"),
  quantity: stryMutAct_9fa48("304") ? "" : (stryCov_9fa48("304"), "ve-curve")
}), stryMutAct_9fa48("305") ? {} : (stryCov_9fa48("305"), {
  path: stryMutAct_9fa48("306") ? "" : (stryCov_9fa48("306"), "engine.chargeTemperatureExponent"),
  label: stryMutAct_9fa48("307") ? "" : (stryCov_9fa48("307"), "Charge temperature exponent"),
  quantity: stryMutAct_9fa48("308") ? "" : (stryCov_9fa48("308"), "plain"),
  digits: 2,
  absent: stryMutAct_9fa48("309") ? "" : (stryCov_9fa48("309"), "model default (0.5)"),
  advanced: stryMutAct_9fa48("310") ? false : (stryCov_9fa48("310"), true)
}), stryMutAct_9fa48("311") ? {} : (stryCov_9fa48("311"), {
  path: stryMutAct_9fa48("312") ? "" : (stryCov_9fa48("312"), "engine.compressionRatio"),
  label: stryMutAct_9fa48("313") ? "" : (stryCov_9fa48("313"), "Compression ratio"),
  quantity: stryMutAct_9fa48("314") ? "" : (stryCov_9fa48("314"), "plain"),
  digits: 1,
  absent: stryMutAct_9fa48("315") ? "" : (stryCov_9fa48("315"), "not given (residual gas left out)"),
  advanced: stryMutAct_9fa48("316") ? false : (stryCov_9fa48("316"), true)
}), stryMutAct_9fa48("317") ? {} : (stryCov_9fa48("317"), {
  path: stryMutAct_9fa48("318") ? "" : (stryCov_9fa48("318"), "engine.exhaustBackPressure"),
  label: stryMutAct_9fa48("319") ? "" : (stryCov_9fa48("319"), "Exhaust back pressure (gauge)"),
  quantity: stryMutAct_9fa48("320") ? "" : (stryCov_9fa48("320"), "pressure"),
  digits: 2,
  absent: stryMutAct_9fa48("321") ? "" : (stryCov_9fa48("321"), "model default (0)"),
  advanced: stryMutAct_9fa48("322") ? false : (stryCov_9fa48("322"), true)
}), stryMutAct_9fa48("323") ? {} : (stryCov_9fa48("323"), {
  path: stryMutAct_9fa48("324") ? "" : (stryCov_9fa48("324"), "blower.kind"),
  label: stryMutAct_9fa48("325") ? "" : (stryCov_9fa48("325"), "Blower kind"),
  quantity: stryMutAct_9fa48("326") ? "" : (stryCov_9fa48("326"), "text")
}), stryMutAct_9fa48("327") ? {} : (stryCov_9fa48("327"), {
  path: stryMutAct_9fa48("328") ? "" : (stryCov_9fa48("328"), "blower.displacementPerRev"),
  label: stryMutAct_9fa48("329") ? "" : (stryCov_9fa48("329"), "Blower displacement"),
  quantity: stryMutAct_9fa48("330") ? "" : (stryCov_9fa48("330"), "blower-displacement"),
  digits: 2
}), stryMutAct_9fa48("331") ? {} : (stryCov_9fa48("331"), {
  path: stryMutAct_9fa48("332") ? "" : (stryCov_9fa48("332"), "blower.builtInVolumeRatio"),
  label: stryMutAct_9fa48("333") ? "" : (stryCov_9fa48("333"), "Built-in volume ratio"),
  quantity: stryMutAct_9fa48("334") ? "" : (stryCov_9fa48("334"), "plain"),
  digits: 2
}), stryMutAct_9fa48("335") ? {} : (stryCov_9fa48("335"), {
  path: stryMutAct_9fa48("336") ? "" : (stryCov_9fa48("336"), "blower.maxRpm"),
  label: stryMutAct_9fa48("337") ? "" : (stryCov_9fa48("337"), "Blower speed limit"),
  quantity: stryMutAct_9fa48("338") ? "" : (stryCov_9fa48("338"), "speed"),
  digits: 0
}), stryMutAct_9fa48("339") ? {} : (stryCov_9fa48("339"), {
  path: stryMutAct_9fa48("340") ? "" : (stryCov_9fa48("340"), "blower.volumetricEfficiencyRef"),
  label: stryMutAct_9fa48("341") ? "" : (stryCov_9fa48("341"), "Blower reference volumetric efficiency"),
  editorLabel: stryMutAct_9fa48("342") ? "" : (stryCov_9fa48("342"), "Blower volumetric efficiency"),
  quantity: stryMutAct_9fa48("343") ? "" : (stryCov_9fa48("343"), "percent")
}), stryMutAct_9fa48("344") ? {} : (stryCov_9fa48("344"), {
  path: stryMutAct_9fa48("345") ? "" : (stryCov_9fa48("345"), "blower.referenceRpm"),
  label: stryMutAct_9fa48("346") ? "" : (stryCov_9fa48("346"), "Blower reference speed"),
  editorLabel: stryMutAct_9fa48("347") ? "" : (stryCov_9fa48("347"), "Reference blower speed"),
  quantity: stryMutAct_9fa48("348") ? "" : (stryCov_9fa48("348"), "speed"),
  digits: 0
}), stryMutAct_9fa48("349") ? {} : (stryCov_9fa48("349"), {
  path: stryMutAct_9fa48("350") ? "" : (stryCov_9fa48("350"), "blower.internalEfficiency"),
  label: stryMutAct_9fa48("351") ? "" : (stryCov_9fa48("351"), "Blower internal efficiency"),
  quantity: stryMutAct_9fa48("352") ? "" : (stryCov_9fa48("352"), "percent")
}), stryMutAct_9fa48("353") ? {} : (stryCov_9fa48("353"), {
  path: stryMutAct_9fa48("354") ? "" : (stryCov_9fa48("354"), "blower.mechanicalEfficiency"),
  label: stryMutAct_9fa48("355") ? "" : (stryCov_9fa48("355"), "Drive mechanical efficiency"),
  quantity: stryMutAct_9fa48("356") ? "" : (stryCov_9fa48("356"), "percent")
}), stryMutAct_9fa48("357") ? {} : (stryCov_9fa48("357"), {
  path: stryMutAct_9fa48("358") ? "" : (stryCov_9fa48("358"), "drive.crankPulleyDiameter"),
  label: stryMutAct_9fa48("359") ? "" : (stryCov_9fa48("359"), "Crank pulley diameter"),
  quantity: stryMutAct_9fa48("360") ? "" : (stryCov_9fa48("360"), "length-small"),
  digits: 2
}), stryMutAct_9fa48("361") ? {} : (stryCov_9fa48("361"), {
  path: stryMutAct_9fa48("362") ? "" : (stryCov_9fa48("362"), "drive.blowerPulleyDiameter"),
  label: stryMutAct_9fa48("363") ? "" : (stryCov_9fa48("363"), "Blower pulley diameter"),
  quantity: stryMutAct_9fa48("364") ? "" : (stryCov_9fa48("364"), "length-small"),
  digits: 2
}), stryMutAct_9fa48("365") ? {} : (stryCov_9fa48("365"), {
  path: stryMutAct_9fa48("366") ? "" : (stryCov_9fa48("366"), "drive.beltSlip"),
  label: stryMutAct_9fa48("367") ? "" : (stryCov_9fa48("367"), "Belt slip"),
  quantity: stryMutAct_9fa48("368") ? "" : (stryCov_9fa48("368"), "percent")
}), stryMutAct_9fa48("369") ? {} : (stryCov_9fa48("369"), {
  path: stryMutAct_9fa48("370") ? "" : (stryCov_9fa48("370"), "ambient.pressure"),
  label: stryMutAct_9fa48("371") ? "" : (stryCov_9fa48("371"), "Ambient pressure (absolute)"),
  editorLabel: stryMutAct_9fa48("372") ? "" : (stryCov_9fa48("372"), "Barometer (absolute)"),
  quantity: stryMutAct_9fa48("373") ? "" : (stryCov_9fa48("373"), "pressure"),
  digits: 1
}), stryMutAct_9fa48("374") ? {} : (stryCov_9fa48("374"), {
  path: stryMutAct_9fa48("375") ? "" : (stryCov_9fa48("375"), "ambient.temperature"),
  label: stryMutAct_9fa48("376") ? "" : (stryCov_9fa48("376"), "Ambient temperature"),
  quantity: stryMutAct_9fa48("377") ? "" : (stryCov_9fa48("377"), "temperature"),
  digits: 0
}), stryMutAct_9fa48("378") ? {} : (stryCov_9fa48("378"), {
  path: stryMutAct_9fa48("379") ? "" : (stryCov_9fa48("379"), "ambient.inletLoss"),
  label: stryMutAct_9fa48("380") ? "" : (stryCov_9fa48("380"), "Inlet pressure loss"),
  quantity: stryMutAct_9fa48("381") ? "" : (stryCov_9fa48("381"), "pressure"),
  digits: 2
}), stryMutAct_9fa48("382") ? {} : (stryCov_9fa48("382"), {
  path: stryMutAct_9fa48("383") ? "" : (stryCov_9fa48("383"), "ambient.inletRestriction.ratedFlow"),
  label: stryMutAct_9fa48("384") ? "" : (stryCov_9fa48("384"), "Rated flow of the inlet"),
  quantity: stryMutAct_9fa48("385") ? "" : (stryCov_9fa48("385"), "airflow"),
  digits: 0,
  absent: stryMutAct_9fa48("386") ? "" : (stryCov_9fa48("386"), "no flow-rated inlet"),
  advanced: stryMutAct_9fa48("387") ? false : (stryCov_9fa48("387"), true)
}), stryMutAct_9fa48("388") ? {} : (stryCov_9fa48("388"), {
  path: stryMutAct_9fa48("389") ? "" : (stryCov_9fa48("389"), "ambient.inletRestriction.ratingDepression"),
  label: stryMutAct_9fa48("390") ? "" : (stryCov_9fa48("390"), "Inlet rating depression"),
  quantity: stryMutAct_9fa48("391") ? "" : (stryCov_9fa48("391"), "pressure"),
  digits: 2,
  absent: stryMutAct_9fa48("392") ? "" : (stryCov_9fa48("392"), "model default (1.5 inHg)"),
  advanced: stryMutAct_9fa48("393") ? false : (stryCov_9fa48("393"), true)
}), stryMutAct_9fa48("394") ? {} : (stryCov_9fa48("394"), {
  path: stryMutAct_9fa48("395") ? "" : (stryCov_9fa48("395"), "intercooler.effectiveness"),
  label: stryMutAct_9fa48("396") ? "" : (stryCov_9fa48("396"), "Intercooler effectiveness"),
  quantity: stryMutAct_9fa48("397") ? "" : (stryCov_9fa48("397"), "percent"),
  absent: stryMutAct_9fa48("398") ? "" : (stryCov_9fa48("398"), "no intercooler")
}), stryMutAct_9fa48("399") ? {} : (stryCov_9fa48("399"), {
  path: stryMutAct_9fa48("400") ? "" : (stryCov_9fa48("400"), "intercooler.pressureDrop"),
  label: stryMutAct_9fa48("401") ? "" : (stryCov_9fa48("401"), "Intercooler pressure drop"),
  quantity: stryMutAct_9fa48("402") ? "" : (stryCov_9fa48("402"), "pressure"),
  digits: 2,
  absent: stryMutAct_9fa48("403") ? "" : (stryCov_9fa48("403"), "no intercooler")
}), stryMutAct_9fa48("404") ? {} : (stryCov_9fa48("404"), {
  path: stryMutAct_9fa48("405") ? "" : (stryCov_9fa48("405"), "intercooler.coolantTemperature"),
  label: stryMutAct_9fa48("406") ? "" : (stryCov_9fa48("406"), "Intercooler coolant temperature"),
  editorLabel: stryMutAct_9fa48("407") ? "" : (stryCov_9fa48("407"), "Coolant temperature"),
  quantity: stryMutAct_9fa48("408") ? "" : (stryCov_9fa48("408"), "temperature"),
  digits: 0,
  absent: stryMutAct_9fa48("409") ? "" : (stryCov_9fa48("409"), "no intercooler")
}), stryMutAct_9fa48("410") ? {} : (stryCov_9fa48("410"), {
  path: stryMutAct_9fa48("411") ? "" : (stryCov_9fa48("411"), "fuel.afr"),
  label: stryMutAct_9fa48("412") ? "" : (stryCov_9fa48("412"), "Air-fuel ratio"),
  quantity: stryMutAct_9fa48("413") ? "" : (stryCov_9fa48("413"), "plain"),
  digits: 1
}), stryMutAct_9fa48("414") ? {} : (stryCov_9fa48("414"), {
  path: stryMutAct_9fa48("415") ? "" : (stryCov_9fa48("415"), "fuel.bsfc"),
  label: stryMutAct_9fa48("416") ? "" : (stryCov_9fa48("416"), "BSFC"),
  quantity: stryMutAct_9fa48("417") ? "" : (stryCov_9fa48("417"), "bsfc"),
  digits: 2
}), stryMutAct_9fa48("418") ? {} : (stryCov_9fa48("418"), {
  path: stryMutAct_9fa48("419") ? "" : (stryCov_9fa48("419"), "fuel.injectorCount"),
  label: stryMutAct_9fa48("420") ? "" : (stryCov_9fa48("420"), "Injectors"),
  editorLabel: stryMutAct_9fa48("421") ? "" : (stryCov_9fa48("421"), "Number of injectors"),
  quantity: stryMutAct_9fa48("422") ? "" : (stryCov_9fa48("422"), "count")
}), stryMutAct_9fa48("423") ? {} : (stryCov_9fa48("423"), {
  path: stryMutAct_9fa48("424") ? "" : (stryCov_9fa48("424"), "fuel.injectorFlow"),
  label: stryMutAct_9fa48("425") ? "" : (stryCov_9fa48("425"), "Injector flow (each)"),
  editorLabel: stryMutAct_9fa48("426") ? "" : (stryCov_9fa48("426"), "Flow of one injector"),
  quantity: stryMutAct_9fa48("427") ? "" : (stryCov_9fa48("427"), "injector-flow"),
  digits: 0
}), stryMutAct_9fa48("428") ? {} : (stryCov_9fa48("428"), {
  path: stryMutAct_9fa48("429") ? "" : (stryCov_9fa48("429"), "fuel.maxDuty"),
  label: stryMutAct_9fa48("430") ? "" : (stryCov_9fa48("430"), "Maximum injector duty"),
  quantity: stryMutAct_9fa48("431") ? "" : (stryCov_9fa48("431"), "percent")
}), stryMutAct_9fa48("432") ? {} : (stryCov_9fa48("432"), {
  path: stryMutAct_9fa48("433") ? "" : (stryCov_9fa48("433"), "fuel.evaporatedBeforeBlower"),
  label: stryMutAct_9fa48("434") ? "" : (stryCov_9fa48("434"), "Fuel evaporated before the blower"),
  quantity: stryMutAct_9fa48("435") ? "" : (stryCov_9fa48("435"), "percent")
}), stryMutAct_9fa48("436") ? {} : (stryCov_9fa48("436"), {
  path: stryMutAct_9fa48("437") ? "" : (stryCov_9fa48("437"), "fuel.evaporatedInBlower"),
  label: stryMutAct_9fa48("438") ? "" : (stryCov_9fa48("438"), "Fuel evaporated in the blower"),
  quantity: stryMutAct_9fa48("439") ? "" : (stryCov_9fa48("439"), "percent"),
  absent: stryMutAct_9fa48("440") ? "" : (stryCov_9fa48("440"), "model default (0 %)"),
  advanced: stryMutAct_9fa48("441") ? false : (stryCov_9fa48("441"), true)
}), stryMutAct_9fa48("442") ? {} : (stryCov_9fa48("442"), {
  path: stryMutAct_9fa48("443") ? "" : (stryCov_9fa48("443"), "fuel.evaporatedInPort"),
  label: stryMutAct_9fa48("444") ? "" : (stryCov_9fa48("444"), "Fuel evaporated in the port"),
  quantity: stryMutAct_9fa48("445") ? "" : (stryCov_9fa48("445"), "percent"),
  absent: stryMutAct_9fa48("446") ? "" : (stryCov_9fa48("446"), "model default (0 %)"),
  advanced: stryMutAct_9fa48("447") ? false : (stryCov_9fa48("447"), true)
})]);

/** Fields the editor has that the spec does not store (VE rows by "#", the altitude for the barometer). */
export const FORM_ONLY_FIELDS: readonly SpecField[] = stryMutAct_9fa48("448") ? [] : (stryCov_9fa48("448"), [stryMutAct_9fa48("449") ? {} : (stryCov_9fa48("449"), {
  path: stryMutAct_9fa48("450") ? "" : (stryCov_9fa48("450"), "engine.veCurve.#.rpm"),
  label: stryMutAct_9fa48("451") ? "" : (stryCov_9fa48("451"), "Engine speed"),
  quantity: stryMutAct_9fa48("452") ? "" : (stryCov_9fa48("452"), "speed")
}), stryMutAct_9fa48("453") ? {} : (stryCov_9fa48("453"), {
  path: stryMutAct_9fa48("454") ? "" : (stryCov_9fa48("454"), "engine.veCurve.#.ve"),
  label: stryMutAct_9fa48("455") ? "" : (stryCov_9fa48("455"), "Volumetric efficiency"),
  quantity: stryMutAct_9fa48("456") ? "" : (stryCov_9fa48("456"), "percent")
}), stryMutAct_9fa48("457") ? {} : (stryCov_9fa48("457"), {
  path: stryMutAct_9fa48("458") ? "" : (stryCov_9fa48("458"), "ambient.altitude"),
  label: stryMutAct_9fa48("459") ? "" : (stryCov_9fa48("459"), "Altitude"),
  quantity: stryMutAct_9fa48("460") ? "" : (stryCov_9fa48("460"), "altitude")
})]);
const BY_PATH = new Map((stryMutAct_9fa48("461") ? [] : (stryCov_9fa48("461"), [...SPEC_FIELDS, ...FORM_ONLY_FIELDS])).map(stryMutAct_9fa48("462") ? () => undefined : (stryCov_9fa48("462"), f => stryMutAct_9fa48("463") ? [] : (stryCov_9fa48("463"), [f.path, f]))));

/** A field by dotted path, VE row indexes folded to "#". */
export function fieldAt(path: string): SpecField | undefined {
  if (stryMutAct_9fa48("464")) {
    {}
  } else {
    stryCov_9fa48("464");
    return BY_PATH.get(path.replace(stryMutAct_9fa48("466") ? /\.\D+\./ : stryMutAct_9fa48("465") ? /\.\d\./ : (stryCov_9fa48("465", "466"), /\.\d+\./), stryMutAct_9fa48("467") ? "" : (stryCov_9fa48("467"), ".#.")));
  }
}

/** The editor's label for a field (throws on a path the table lacks: a typo in the editor). */
export function editorLabelOf(path: string): string {
  if (stryMutAct_9fa48("468")) {
    {}
  } else {
    stryCov_9fa48("468");
    const f = fieldAt(path);
    if (stryMutAct_9fa48("471") ? false : stryMutAct_9fa48("470") ? true : stryMutAct_9fa48("469") ? f : (stryCov_9fa48("469", "470", "471"), !f)) throw new Error(stryMutAct_9fa48("472") ? `` : (stryCov_9fa48("472"), `No field ${path} in the combination field table`));
    return stryMutAct_9fa48("473") ? f.editorLabel && f.label : (stryCov_9fa48("473"), f.editorLabel ?? f.label);
  }
}

/** The value at a dotted path of a spec (undefined where a part is absent). */
export function valueAt(spec: unknown, path: string): unknown {
  if (stryMutAct_9fa48("474")) {
    {}
  } else {
    stryCov_9fa48("474");
    return path.split(stryMutAct_9fa48("475") ? "" : (stryCov_9fa48("475"), ".")).reduce<unknown>(stryMutAct_9fa48("476") ? () => undefined : (stryCov_9fa48("476"), (o, k) => (stryMutAct_9fa48("479") ? o || typeof o === "object" : stryMutAct_9fa48("478") ? false : stryMutAct_9fa48("477") ? true : (stryCov_9fa48("477", "478", "479"), o && (stryMutAct_9fa48("481") ? typeof o !== "object" : stryMutAct_9fa48("480") ? true : (stryCov_9fa48("480", "481"), typeof o === (stryMutAct_9fa48("482") ? "" : (stryCov_9fa48("482"), "object")))))) ? (o as Record<string, unknown>)[k] : undefined), spec);
  }
}