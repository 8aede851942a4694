/**
 * Checks of each sense of the load. Tension runs the code's checks on the joint as built. Compression
 * runs the bolt checks (shear, bearing, slip) of the same code on the joint with its bearing directions
 * reversed, and the code's own compression checks (gross section, cover strut, compression pitch).
 * Both senses' strength checks are scaled to the reference load (model/load.ts).
 */
import type { CodeChecks, DesignCode } from "../codes/types.js";
import { mapped } from "../model/lists.js";
import type { Joint, PlateConnection, PlatePiece } from "../model/joint.js";
import { groupIndex, withConnections, withPlates } from "../geometry/joint-builder.js";
import { factoredOf, loadSenses, referenceLoad_N, type LoadSense } from "../model/load.js";
import type { CheckResult } from "../model/results.js";
import { codeChecks, relabelled } from "../codes/check-builders.js";
import type { CheckableScenario } from "../model/scenario.js";

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
  const spans = otherGroupSpans(joint);
  const flip = (plate: PlatePiece, c: PlateConnection): PlateConnection => {
    const toward = (-c.towardEnd) as 1 | -1;
    if (plate.role !== "cover") return { group: c.group, endX_mm: toward * Infinity, towardEnd: toward };
    const other = spans[groupIndex(joint, c.group)]!;
    const nearest = toward > 0 ? other.minX_mm : other.maxX_mm;
    return { group: c.group, endX_mm: nearest - toward * 0.75 * other.d0_mm, towardEnd: toward };
  };
  return withPlates(joint, mapped(joint.plates, (p) => withConnections(p, mapped(p.connections, (c) => flip(p, c)))));
}

/** What a cover's bolts of one group bear toward in compression: the holes of the other groups. */
interface OtherGroupSpan {
  /** The largest hole length along the force of the other groups' holes, mm. */
  d0_mm: number;
  /** The least and greatest x of the other groups' holes, mm (±Infinity when there are none). */
  minX_mm: number;
  maxX_mm: number;
}

/** Per bolt group of the joint (in its order), the span of every hole of the other groups, in one walk each. */
function otherGroupSpans(joint: Joint): OtherGroupSpan[] {
  return mapped(joint.groups, (g) => {
    // The max and min of no holes are −Infinity and ±Infinity, as Math.max() and Math.min() of nothing.
    let d0 = -Infinity;
    let minX = Infinity;
    let maxX = -Infinity;
    for (const h of joint.holes) {
      if (h.group === g.id) continue;
      d0 = Math.max(d0, h.along_mm);
      minX = Math.min(minX, h.x_mm);
      maxX = Math.max(maxX, h.x_mm);
    }
    return { d0_mm: d0, minX_mm: minX, maxX_mm: maxX };
  });
}

/** The scenario with the given force standing for the tension of the code's checks. */
function asLoad(scenario: CheckableScenario, factored_N: number, service_N: number | undefined): CheckableScenario {
  const load = service_N !== undefined ? { factoredTension_N: factored_N, serviceTension_N: service_N } : { factoredTension_N: factored_N };
  return { ...scenario, load };
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

/** Whether a check is of a kind of the code's own checks that apply in compression too, with the bearing directions reversed: bolt shear, bearing, slip. */
function isBoltKind(kind: CheckResult["kind"]): boolean {
  return kind === "bolt-shear" || kind === "bolt-bearing" || kind === "slip";
}

/** Every check of the given senses of the scenario's load (loadSenses of it, worked out by the caller). */
export function checksOfSenses(joint: Joint, scenario: CheckableScenario, code: DesignCode, senses: readonly LoadSense[]): CodeChecks {
  if (senses.indexOf("compression") < 0) return code.checkJoint(joint, scenario);
  const ref = referenceLoad_N(scenario.load);
  const C = factoredOf(scenario.load, "compression");
  const reversal = senses.length === 2;
  const comp = code.compression;
  if (!comp) throw new RangeError(`${code.id} has no compression checks`);
  const share = comp.spliceShare(scenario);
  const checks: CheckResult[] = [];
  const warnings: CodeChecks["warnings"] = [];
  // Tension, or (compression only) the rules of the layout, which hold whatever the sense.
  const serviceC = scenario.load.serviceCompression_N;
  const compressionAlone = reversal ? null : asLoad(scenario, C, serviceC);
  const base = compressionAlone ? code.checkJoint(joint, compressionAlone, "layout") : code.checkJoint(joint, scenario);
  for (const c of base.checks) {
    if (c.type === "rule") checks.push(c);
    else if (reversal) checks.push(labelled(c, "tension", 1, true));
  }
  for (const w of base.warnings) warnings.push(w);
  // Compression: the bolt checks with the bearing directions reversed, at the force the splice carries.
  const carried = share.value * C;
  // The whole compression carried (no contact share): the scenario of the layout rules has that load already.
  const carriedLoad = compressionAlone && share.value === 1 ? compressionAlone : asLoad(scenario, carried, serviceC === undefined ? undefined : share.value * serviceC);
  const flipped = code.checkJoint(compressionJoint(joint), carriedLoad, "bolts");
  const symbol = share.value === 1 ? "C" : `${share.value} C`;
  for (const c of flipped.checks) if (c.type === "strength" && isBoltKind(c.kind)) checks.push(labelled(c, "compression", carried / ref, reversal, symbol));
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
