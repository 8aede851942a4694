/**
 * Checks of each sense of the load. Tension runs the code's checks on the joint as built. Compression
 * runs the bolt checks (shear, bearing, slip) of the same code on the joint with its bearing directions
 * reversed, and the code's own compression checks (gross section, cover strut, compression pitch).
 * Both senses' strength checks are scaled to the reference load (model/load.ts).
 */
import type { CodeChecks, DesignCode } from "../codes/types.js";
import { mapped } from "../model/lists.js";
import type { Joint, PlateConnection, PlatePiece } from "../model/joint.js";
import { withConnections, withPlates } from "../geometry/joint-builder.js";
import { factoredOf, loadSenses, referenceLoad_N, type LoadSense } from "../model/load.js";
import type { CheckResult } from "../model/results.js";
import { codeChecks, relabelled } from "../codes/check-builders.js";
import type { CheckableScenario } from "../model/scenario.js";

/** Kinds of the code's own checks that apply in compression too, with the bearing directions reversed. */
const BOLT_KINDS = new Set<CheckResult["kind"]>(["bolt-shear", "bolt-bearing", "slip"]);

/**
 * The direction each plate bears in compression. A main plate pushes toward the butt, so its bolts bear
 * on the metal behind them, where the plate continues: no end, the end distance is unbounded and only
 * the pitch to the hole behind counts. A cover is pushed toward the butt by each group, so its bolts bear
 * toward the other group's holes: its "end" is put 0.75·d0 short of the other group's nearest hole line,
 * which gives the e-term e/3d0 = p/3d0 − 1/4 of IS 800 and EN 1993-1-8 with p the spacing across the
 * butt (the holes of the two groups are mirror images, so each hole has one of the other group straight
 * ahead), and a shorter clear distance than the hole ahead under AISC 360-16 (the reading that refuses more).
 */
export function compressionJoint(joint: Joint): Joint {
  const flip = (plate: PlatePiece, c: PlateConnection): PlateConnection => {
    const toward = (-c.towardEnd) as 1 | -1;
    if (plate.role !== "cover") return { group: c.group, endX_mm: toward * Infinity, towardEnd: toward };
    const other = joint.holes.filter((h) => h.group !== c.group);
    const d0 = Math.max(...other.map((h) => h.along_mm));
    const nearest = toward > 0 ? Math.min(...other.map((h) => h.x_mm)) : Math.max(...other.map((h) => h.x_mm));
    return { group: c.group, endX_mm: nearest - toward * 0.75 * d0, towardEnd: toward };
  };
  return withPlates(joint, mapped(joint.plates, (p) => withConnections(p, mapped(p.connections, (c) => flip(p, c)))));
}

/** The scenario with the given force standing for the tension of the code's checks. */
function asLoad(scenario: CheckableScenario, factored_N: number, service_N: number | undefined): CheckableScenario {
  return { ...scenario, load: { factoredTension_N: factored_N, ...(service_N !== undefined ? { serviceTension_N: service_N } : {}) } };
}

/**
 * A check labelled with its sense and its load ratio scaled from its own load to the reference load:
 * a new result of the same fixed shape (check-builders.ts), its text read from the original on demand.
 */
function labelled(c: CheckResult, sense: LoadSense, scale: number, reversal: boolean, loadSymbol = "C"): CheckResult {
  const title = c.type === "strength" && (reversal || sense === "compression") ? `${c.title} (${sense})` : c.title;
  const id = sense === "compression" ? `compression:${c.id}` : c.id;
  // The code's bolt checks name the force they were given T; in compression it is the compression the splice carries.
  const substituted = sense === "compression" ? () => c.substituted.replace(/× T\b/g, `× ${loadSymbol}`) : () => c.substituted;
  const notes = () => c.notes;
  return relabelled(c, id, title, sense, scale, substituted, notes);
}

/** Every check of every sense of the scenario's load. */
export function checksBySense(joint: Joint, scenario: CheckableScenario, code: DesignCode): CodeChecks {
  const senses = loadSenses(scenario.load);
  const ref = referenceLoad_N(scenario.load);
  const C = factoredOf(scenario.load, "compression");
  if (!senses.includes("compression")) return code.checkJoint(joint, scenario);
  const reversal = senses.length === 2;
  const comp = code.compression;
  if (!comp) throw new RangeError(`${code.id} has no compression checks`);
  const share = comp.spliceShare(scenario);
  const checks: CheckResult[] = [];
  const warnings: CodeChecks["warnings"] = [];
  // Tension, or (compression only) the rules of the layout, which hold whatever the sense.
  const base = reversal ? code.checkJoint(joint, scenario) : code.checkJoint(joint, asLoad(scenario, C, scenario.load.serviceCompression_N), "layout");
  for (const c of base.checks) {
    if (c.type === "rule") checks.push(c);
    else if (reversal) checks.push(labelled(c, "tension", 1, true));
  }
  warnings.push(...base.warnings);
  // Compression: the bolt checks with the bearing directions reversed, at the force the splice carries.
  const carried = share.value * C;
  const serviceC = scenario.load.serviceCompression_N;
  const flipped = code.checkJoint(compressionJoint(joint), asLoad(scenario, carried, serviceC === undefined ? undefined : share.value * serviceC), "bolts");
  const symbol = share.value === 1 ? "C" : `${share.value} C`;
  for (const c of flipped.checks) if (c.type === "strength" && BOLT_KINDS.has(c.kind)) checks.push(labelled(c, "compression", carried / ref, reversal, symbol));
  const own = comp.checks(joint, scenario, share.value);
  for (const c of own.checks) checks.push(labelled(c, "compression", c.type === "strength" ? C / ref : 1, reversal));
  // The conventions in words, written when an output reads them.
  const conventions = () => [
    ...base.conventions,
    "compression: bolts bear away from the butt on the main plates (the plate continues behind them: no end distance, the pitch to the hole behind) and toward the other group's holes on the covers; no net-section rupture or block shear in compression",
    share.text,
    ...own.conventions,
  ];
  return codeChecks(checks, warnings, conventions);
}
