/**
 * ANSI/AISC 360-16, Specification for Structural Steel Buildings, load and resistance factor design
 * (LRFD), as a design-code module. Inch bolts (Table J3.3 etc.) and metric bolts (J3.3M etc.); ASTM
 * plates A36 and A572 Grade 50; ASTM F3125 A325 / A490 and A307 bolts.
 */
import { INCH_BOLT_SIZES_IN, inchBoltSize } from "../../catalogue/bolts.js";
import { mapped, pushAll } from "../../model/lists.js";
import { MM_PER_IN } from "./factors.js";
import { astmPlateGrade } from "../../catalogue/steels.js";
import type { Joint } from "../../model/joint.js";
import type { CheckResult } from "../../model/results.js";
import { platesWithPaths, type CheckableScenario, type EfficiencyBasis, type PlateSpec, type Scenario } from "../../model/scenario.js";
import { unperforatedOnBasis } from "../efficiency.js";
import { blockShearConvention } from "../../geometry/block-shear.js";
import { factorWarnings } from "../is800-2007/joint-checks.js";
import type { CheckScope, CodeChecks, DesignCode, ScopeError } from "../types.js";
import { boltChecksOnly, codeChecks } from "../check-builders.js";
import { unitText, type UnitText } from "./display.js";
import { holeDimensions } from "./holes.js";
import { aiscBolt, blockShearCheck, boltShearCheck, grossYieldCheck, groupBearingCheck, GoverningBlocks, groupShear, GroupStrengths, netSectionCheck, slipCheck, type GroupShear } from "./joint-checks.js";
import { astmGradeOf, GRADES, plateStrength, Tb_N } from "./materials.js";
import { phiPnRupture, phiPnYield } from "./tension.js";
import { searchLimits, strengthBound } from "./search-bounds.js";
import { AISC_COMPRESSION } from "./compression-splice.js";
import { SLIP_CLASSES } from "./slip.js";
import { centroidRule, edgeRules, fillerRule, maxSpacingRule, spacingRuleAndWarning } from "./spacing.js";

export const AISC360_ID = "aisc360-16";

/** Metric sizes of AISC 360-16 Tables J3.3M and J3.4M as implemented. */
const METRIC_SIZES = [16, 20, 22, 24, 27, 30, 36];

/** Inputs AISC 360-16 (as implemented here) cannot check, each with its scenario path. */
function scopeErrors(scenario: Scenario): ScopeError[] {
  const errors: ScopeError[] = [];
  for (const [path, spec] of platesWithPaths(scenario)) {
    if (!astmPlateGrade(spec.grade)) errors.push({ path: `${path}.grade`, message: `unknown ASTM plate grade "${spec.grade}" for AISC 360-16 (known: ${GRADES.join(", ")})` });
  }
  const bolts = scenario.bolts;
  if (bolts) {
    const d = bolts.size_mm;
    const grade = astmGradeOf(bolts);
    if (!grade) errors.push({ path: "bolts.class", message: `class ${bolts.propertyClass} has no ASTM grade under AISC 360-16 (use A325, A490 or A307; ISO 4.6, 8.8, 10.9 are read as A307, A325, A490)` });
    if (bolts.hole !== "standard") errors.push({ path: "bolts.hole", message: `${bolts.hole} holes: the Table J3.5 edge-distance increments are not implemented for AISC 360-16; use standard holes` });
    if (bolts.preloaded && grade === "A307") errors.push({ path: "bolts.class", message: "A307 bolts cannot be pretensioned (AISC 360-16 J3.1: pretensioned joints take Group A or B bolts)" });
    if (bolts.assembly === "friction-grip") {
      if (grade === "A307") errors.push({ path: "bolts.class", message: "A307 bolts cannot be slip-critical (AISC 360-16 J3.1: pretensioned Group A or B bolts)" });
      const mu = bolts.slipFactor;
      if (mu === undefined) errors.push({ path: "bolts.slip_factor", message: "required for slip-critical bolts: 0.30 (Class A) or 0.50 (Class B), AISC 360-16 J3.8" });
      else if (mu !== SLIP_CLASSES.A && mu !== SLIP_CLASSES.B) errors.push({ path: "bolts.slip_factor", message: `${mu} is not a slip class of AISC 360-16 J3.8 (0.30 Class A, 0.50 Class B)` });
      if (grade && grade !== "A307" && Tb_N(d, grade === "A490" ? "Group B" : "Group A", inchBoltSize(d)) === undefined) {
        errors.push({ path: "bolts.size", message: `no pretension for this size in AISC 360-16 Table J3.1/J3.1M` });
      }
    }
  }
  return errors;
}

/** The bolt shear of the group with this id. */
function shearOf(shears: readonly GroupShear[], group: GroupShear["group"]["id"]): GroupShear {
  for (const s of shears) if (s.group.id === group) return s;
  throw new RangeError(`no bolt group ${group} in the joint`);
}

function checkJoint(joint: Joint, scenario: CheckableScenario, scope: CheckScope = "all"): CodeChecks {
  const shears = mapped(joint.groups, (g) => groupShear(joint, scenario, g));
  const slipCritical = scenario.bolts.assembly === "friction-grip";
  if (scope === "bolts") return boltChecksOnly(boltGroupChecks(joint, scenario, shears));
  const checks: CheckResult[] = [];
  if (scope === "all") {
    pushAll(checks, boltGroupChecks(joint, scenario, shears));
    pushAll(checks, plateChecks(joint, scenario));
  }
  // J3.3's minimum spacing and its preferred 3 d come from one walk over the hole pairs.
  const spacing = spacingRuleAndWarning(joint, scenario);
  pushAll(checks, spacing.rules);
  pushAll(checks, maxSpacingRule(joint, scenario));
  pushAll(checks, edgeRules(joint, scenario));
  pushAll(checks, fillerRule(joint, scenario));
  pushAll(checks, centroidRule(joint));
  const bolt = aiscBolt(scenario.bolts);
  // IS 800 and AISC share the eccentric single-shear warning; the long-joint texts there name IS factors, so keep only that one.
  const warnings = factorWarnings(joint, []);
  for (const gs of shears) {
    if (gs.longJoint < 1) warnings.push({ id: "long-joint", message: `${gs.group.id}: fastener pattern longer than ${bolt.inch !== undefined ? "38 in" : "950 mm"}, Fnv × 0.833 (Table J3.2 note [b])` });
  }
  if (spacing.warning) warnings.push(spacing.warning);
  return codeChecks(checks, warnings, () => conventionsOf(joint, scenario, bolt, slipCritical));
}

/** The bolt-group checks: slip (slip-critical bolts, J3.8) and bolt shear per group (J3.6); shear, bearing and tearout per plate and group (J3.10). */
function boltGroupChecks(joint: Joint, scenario: CheckableScenario, shears: readonly GroupShear[]): CheckResult[] {
  const checks: CheckResult[] = [];
  const slipCritical = scenario.bolts.assembly === "friction-grip";
  for (const gs of shears) {
    if (slipCritical) checks.push(slipCheck(joint, scenario, gs));
    checks.push(boltShearCheck(joint, scenario, gs));
  }
  const sums = new GroupStrengths();
  for (const plate of joint.plates) {
    if (plate.role === "packing") continue;
    for (const c of plate.connections) checks.push(groupBearingCheck(joint, scenario, plate, c, shearOf(shears, c.group), sums));
  }
  return checks;
}

/** The plate checks per loaded plate: gross yield (D2(a), J4.1(a)), net-section rupture (D2(b), J4.1(b)), block shear per group (J4.3). */
function plateChecks(joint: Joint, scenario: CheckableScenario): CheckResult[] {
  const checks: CheckResult[] = [];
  const blocks = new GoverningBlocks();
  for (const plate of joint.plates) {
    if (plate.role === "packing") continue;
    checks.push(grossYieldCheck(scenario, plate));
    checks.push(netSectionCheck(joint, scenario, plate));
    for (const c of plate.connections) {
      const block = blockShearCheck(joint, scenario, plate, c, blocks);
      if (block) checks.push(block);
    }
  }
  return checks;
}

/** The conventions of an AISC 360 check in words (written when an output reads them). */
function conventionsOf(joint: Joint, scenario: CheckableScenario, bolt: ReturnType<typeof aiscBolt>, slipCritical: boolean): string[] {
  const conventions = [
    `LRFD; ${bolt.name}, ${bolt.group === "A307" ? "A307" : bolt.threadsIncluded ? "threads included in the shear planes (N)" : "threads excluded from the shear planes (X)"}; Ab = π d²/4 (J3.6)`,
    ...(scenario.bolts.astmGrade === undefined ? [`bolt class ${scenario.bolts.propertyClass} read as its ASTM grade of the same strength level (4.6 → A307, 8.8 → A325, 10.9 → A490)`] : []),
    `bearing and tearout per bolt with the clear distance lc; group strength Σ min(shear, bearing, tearout) (J3.6, J3.10); deformation at service ${(scenario.options.bearingDeformation ?? "considered") === "considered" ? "a design consideration (2.4 d t Fu, 1.2 lc t Fu)" : "not a design consideration (3.0 d t Fu, 1.5 lc t Fu)"}`,
    `main plates as tension members (D2, U = 1); cover plates as connecting elements (J4.1, An ≤ 0.85 Ag); hole widths + ${bolt.inch !== undefined ? "1/16 in" : "2 mm"} in net areas (B4.3b)`,
    scenario.options.netSectionLoad === "transferred"
      ? "net section: load already transferred — each path carries only the load its plate has not yet passed to bolts ahead of it (a scenario switch)"
      : "net section: the whole plate force on every path",
    "each bolt of a group carries an equal share; holes drilled",
    blockShearConvention(scenario.options.blockShearLoad, "block shear (J4.3)"),
  ];
  if (slipCritical) conventions.push("slip-critical: slip checked at the factored load (LRFD), and bolt shear, bearing and tearout also checked (J3.8)");
  if (joint.groups.some((g) => g.packing_mm > 0)) conventions.push(`fillers ${scenario.options.fillersDeveloped ? "developed (their extension and bolts are not checked here)" : "not developed: shear × (1 − 0.4(t − 0.25)) over 1/4 in (J5.2(a)); over 3/4 in refused — the older text of J5.2, kept because it refuses more than 360-16 as recalled (from memory)"}`);
  return conventions;
}

/** Design strength of the unperforated plate on an efficiency basis: 0.90·Fy·Ag (D2(a)), 0.75·Fu·Ag (D2(b) with Ae = Ag), or the lesser. */
function unperforatedStrengthIn(u: UnitText) {
  return (spec: PlateSpec, basis: EfficiencyBasis = "lesser"): { value_N: number; definition: string } => {
    const m = plateStrength(spec);
    const Ag = spec.width_mm * spec.thickness_mm;
    return unperforatedOnBasis(
      {
        yield_N: phiPnYield(Ag, m.fy_MPa),
        rupture_N: phiPnRupture(Ag, m.fu_MPa),
        yieldSymbols: "0.90·Fy·Ag",
        yieldNumbers: () => `0.90 × ${u.stress(m.fy_MPa)} × ${u.area(Ag)}`,
        ruptureSymbols: "0.75·Fu·Ag",
        ruptureNumbers: () => `0.75 × ${u.stress(m.fu_MPa)} × ${u.area(Ag)}`,
      },
      basis,
      (n) => u.force(n),
    );
  };
}

function make(u: UnitText): DesignCode {
  const code: DesignCode = {
    id: AISC360_ID,
    title: "ANSI/AISC 360-16 Specification for Structural Steel Buildings — LRFD",
    grades: GRADES,
    boltSizes_mm: [...METRIC_SIZES, ...INCH_BOLT_SIZES_IN.map((d) => d * MM_PER_IN)],
    holeDimensions,
    plateStrength,
    scopeErrors,
    checkJoint,
    unperforatedStrength: unperforatedStrengthIn(u),
    searchLimits,
    strengthBound,
    compression: AISC_COMPRESSION,
    netStrengthPerWidth: (spec) => phiPnRupture(spec.thickness_mm, plateStrength(spec).fu_MPa),
    classesFor: (assembly) => (assembly === "friction-grip" ? ["8.8", "10.9"] : ["4.6", "8.8", "10.9"]),
    settings: {
      fields: ["units", "options.bearing_deformation", "options.fillers_developed", "bolts.class (ASTM grade)"],
      optionDefaults: {},
      bind: (scenario) => (scenario.units === "us" ? US_CODE : AISC360_16),
    },
  };
  return code;
}

export const AISC360_16: DesignCode = make(unitText({ units: "si" }));
const US_CODE: DesignCode = make(unitText({ units: "us" }));
