/**
 * IS 800:2007 (limit state method) as a design-code module.
 */
import { ownEntry } from "../../catalogue/lookup.js";
import { mapped, pushAll } from "../../model/lists.js";
import { isPropertyClass } from "../../catalogue/bolts.js";
import { IS2062_GRADES } from "../../catalogue/steels.js";
import type { Joint, PlatePiece } from "../../model/joint.js";
import type { CheckResult, StrengthCheck } from "../../model/results.js";
import type { CheckableScenario, EfficiencyBasis, PlateSpec, Scenario } from "../../model/scenario.js";
import { unperforatedOnBasis, valueOnBasis } from "../efficiency.js";
import { blockShearConvention } from "../../geometry/block-shear.js";
import type { CheckScope, CodeChecks, DesignCode, ScopeError } from "../types.js";
import { boltChecksOnly, codeChecks, strength } from "../check-builders.js";
import { holePlates } from "../rule-measures.js";
import { f, kN } from "../format.js";
import { fixedCl } from "./citation.js";
import { PARTIAL_FACTORS } from "./factors.js";
import { holeDimensions } from "./holes.js";
import {
  bearingCheck,
  blockShearCheck,
  BlockShapesOf,
  boltShearCheck,
  factorWarnings,
  grossYieldCheck,
  groupFactors,
  netSectionCheck,
  slipCheck,
  TearOuts,
  type GroupFactors,
} from "./joint-checks.js";
import { GRADES, plateStrength } from "./materials.js";
import { centroidRule, edgeRules, gripRule, maxSpacingRules, minSpacingRule, spacingLayout, type SpacingLayout } from "./spacing.js";
import { Tdg, Tdn } from "./tension-member.js";
import { searchLimits, strengthBound } from "./search-bounds.js";
import { IS800_COMPRESSION } from "./compression-splice.js";
import { PROPERTY_CLASSES } from "../../catalogue/bolts.js";

function scopeErrors(scenario: Scenario): ScopeError[] {
  const errors: ScopeError[] = [];
  const plates: Array<[string, PlateSpec]> = [
    ["plates.main", scenario.plates.mainA],
    ["plates.main_b", scenario.plates.mainB],
    ...scenario.plates.covers.map((c, i): [string, PlateSpec] => [i === 0 ? "plates.cover" : "plates.cover_b", c]),
  ];
  for (const [path, spec] of plates) {
    if (!ownEntry(IS2062_GRADES, spec.grade)) {
      errors.push({ path: `${path}.grade`, message: `unknown IS 2062 grade "${spec.grade}" (known: ${GRADES.join(", ")})` });
    }
  }
  const bolts = scenario.bolts;
  if (bolts) {
    if (!isPropertyClass(bolts.propertyClass)) errors.push({ path: "bolts.class", message: `unknown property class "${bolts.propertyClass}"` });
    if (bolts.assembly === "friction-grip") {
      if (bolts.propertyClass !== "8.8" && bolts.propertyClass !== "10.9") {
        errors.push({ path: "bolts.class", message: `friction-grip bolts must be class 8.8 or 10.9 (IS 800:2007 cl. 10.4; IS 3757), got ${bolts.propertyClass}` });
      }
      if (bolts.slipFactor === undefined) errors.push({ path: "bolts.slip_factor", message: "required for friction-grip bolts (IS 800:2007 Table 20)" });
      else if (bolts.slipFactor > 0.55) errors.push({ path: "bolts.slip_factor", message: `${bolts.slipFactor} exceeds 0.55, the largest μf IS 800:2007 cl. 10.4.3 allows` });
      if ((bolts.slipAt ?? "service") === "service" && scenario.load.factoredCompression_N !== undefined && scenario.load.serviceCompression_N === undefined) {
        errors.push({ path: "load.service_compression", message: "required when friction-grip bolts are designed against slip at service (bolts.slip_at: service) and the splice carries compression" });
      }
      if ((bolts.slipAt ?? "service") === "service" && scenario.load.factoredTension_N > 0 && scenario.load.serviceTension_N === undefined) {
        errors.push({ path: "load.service_tension", message: "required when friction-grip bolts are designed against slip at service (bolts.slip_at: service)" });
      }
    }
  }
  return errors;
}

function checkJoint(joint: Joint, scenario: CheckableScenario, scope: CheckScope = "all"): CodeChecks {
  const gfs = mapped(joint.groups, (g) => groupFactors(joint, g));
  if (scope === "bolts") return boltChecksOnly(boltGroupChecks(joint, scenario, gfs, holePlates(joint)));
  // The plates that carry load (every plate but packing), with their holes, measured once for every check below.
  const layout = spacingLayout(joint);
  const checks: CheckResult[] = [];
  if (scope === "all") {
    pushAll(checks, boltGroupChecks(joint, scenario, gfs, layout.plates));
    pushAll(checks, plateChecks(joint, scenario, layout));
  }
  pushAll(checks, minSpacingRule(joint));
  pushAll(checks, maxSpacingRules(joint, layout));
  pushAll(checks, edgeRules(joint, scenario, layout));
  pushAll(checks, gripRule(joint));
  pushAll(checks, centroidRule(joint));

  return codeChecks(checks, factorWarnings(joint, gfs), () => conventionsOf(scenario));
}

/**
 * The bolt-group checks: slip (friction-grip bolts) and bolt shear per group, cl. 10.4.3, 10.3.3; bearing
 * per plate and group, cl. 10.3.4.
 */
function boltGroupChecks(joint: Joint, scenario: CheckableScenario, gfs: readonly GroupFactors[], loaded: readonly PlatePiece[]): CheckResult[] {
  const checks: CheckResult[] = [];
  const friction = scenario.bolts.assembly === "friction-grip";
  // Friction-grip bolts are checked in bolt shear and bearing at the factored load whatever the slip
  // design: no clause is relied on to waive them (from memory; the reading that refuses more).
  for (const gf of gfs) {
    if (friction) checks.push(slipCheck(joint, scenario, gf));
    checks.push(boltShearCheck(joint, scenario, gf));
  }
  const tearOuts = new TearOuts(joint);
  for (const plate of loaded) for (const c of plate.connections) checks.push(bearingCheck(joint, scenario, plate, c, tearOuts));
  return checks;
}

/** The plate checks per loaded plate: gross yield (cl. 6.2), net-section rupture (cl. 6.3.1), block shear per group (cl. 6.4.1). */
function plateChecks(joint: Joint, scenario: CheckableScenario, layout: SpacingLayout): CheckResult[] {
  const checks: CheckResult[] = [];
  const shapesOf = new BlockShapesOf(joint);
  for (let k = 0; k < layout.plates.length; k++) {
    const plate = layout.plates[k]!;
    checks.push(grossYieldCheck(scenario, plate));
    checks.push(netSectionCheck(joint, scenario, plate, layout.holesOf[k]));
    for (const c of plate.connections) {
      const block = blockShearCheck(joint, scenario, plate, c, shapesOf);
      if (block) checks.push(block);
    }
  }
  return checks;
}

/** The conventions of an IS 800 check in words (written when an output reads them). */
function conventionsOf(scenario: CheckableScenario): string[] {
  const friction = scenario.bolts.assembly === "friction-grip";
  const slipAtUltimate = friction && scenario.bolts.slipAt === "ultimate";
  const conventions: string[] = [
    `bolt net area Anb at the threads (cl. 10.3.3, 10.4.3): ${scenario.options.boltNetArea === "0.78-gross" ? "0.78 × π d²/4 — the approximation Indian design aids use (common practice); the clause defines Anb, it gives no factor" : "the ISO 898-1 tensile stress area"}`,
    `bolt strength: ISO 898-1 ${scenario.options.boltStrength} values`,
    scenario.options.netSectionLoad === "transferred"
      ? "net section: load already transferred — each path carries only the load its plate has not yet passed to bolts ahead of it (a scenario switch; cl. 6.3.1 is silent)"
      : "net section: the whole plate force on every path (cl. 6.3.1 as written)",
    "holes drilled (no punching allowance); each bolt of a group carries an equal share",
  ];
  if (friction) {
    conventions.push(
      slipAtUltimate
        ? "friction grip, slip at the factored load (γmf 1.25); bolt shear and bearing also checked at the factored load (no clause is relied on to waive them — from memory, the reading that refuses more)"
        : "friction grip, slip at service (γmf 1.10); bolt shear and bearing also checked at the factored load",
    );
  }
  conventions.push(blockShearConvention(scenario.options.blockShearLoad, "block shear (cl. 6.4.1)"));
  return conventions;
}

const MINIMUM_DESIGN_ACTION_CITATION = fixedCl("10.7");
const MINIMUM_DESIGN_ACTION_FORMULA = "0.3·Td ≤ Td,joint;  Td = min(Ag·fy/γm0, 0.9·Ag·fu/γm1) of the main plate without holes";
/** The condition's note (the same words every call; a fresh list each time it is read). */
const minimumDesignActionNotes = (): string[] => [
  "a condition on the joint: it sets no load; the connection of a tension member is designed for at least 0.3 × the member's design capacity in tension (cl. 10.7, from memory: read as a design action, the reading that refuses more)",
];

/**
 * Minimum design action on fastenings: the connection of a tension member is designed for at least
 * 0.3 times the member's design capacity in tension, so the joint's design strength in tension must
 * reach 0.3·Td. IS 800:2007, cl. 10.7 (from memory). Read as a design action the connection must carry,
 * not as advice: the reading that refuses more. The member's capacity is the unperforated main plate's:
 * the lesser of Ag·fy/γm0 and 0.9·Ag·fu/γm1, of the weaker main plate. The member's own holes, elsewhere,
 * are not known here, and the larger figure refuses more. A condition: it sets no load (load ratio 0).
 */
function minimumDesignActionCheck(scenario: CheckableScenario, jointTension_N: number): StrengthCheck | null {
  if (!(scenario.load.factoredTension_N > 0)) return null;
  const { mainA, mainB } = scenario.plates;
  const member_N = mainA === mainB ? unperforated(mainA) : Math.min(unperforated(mainA), unperforated(mainB));
  const minimum_N = 0.3 * member_N;
  const holds = minimum_N <= jointTension_N * (1 + 1e-9);
  // Under reversal every tension check is labelled with its sense (engine/senses.ts).
  const reversal = (scenario.load.factoredCompression_N ?? 0) > 0;
  return strength({
    id: "minimum-design-action",
    kind: "minimum-design-action",
    title: reversal ? "Minimum design action on the connection (tension)" : "Minimum design action on the connection",
    ...(reversal ? { sense: "tension" as const } : {}),
    component: "joint",
    citation: MINIMUM_DESIGN_ACTION_CITATION,
    formula: MINIMUM_DESIGN_ACTION_FORMULA,
    substituted: () => `0.3 × ${kN(member_N)} = ${kN(minimum_N)} ${holds ? "≤" : ">"} ${kN(jointTension_N)}, the joint's design strength in tension`,
    limitState: "ULS",
    demand_N: minimum_N,
    resistance_N: jointTension_N,
    loadRatio: 0,
    notes: minimumDesignActionNotes,
  });
}

/** The unperforated plate's design tension strength, the lesser of Ag·fy/γm0 and 0.9·Ag·fu/γm1 (cl. 6.2, 6.3.1), as a number. */
function unperforated(spec: PlateSpec): number {
  return unperforatedStrength(spec).value_N;
}

/**
 * Design tension strength of the unperforated plate on an efficiency basis: cl. 6.2 gross yield
 * Ag·fy/γm0, cl. 6.3.1 rupture with An = Ag, 0.9·Ag·fu/γm1, or the lesser of the two. The number is
 * worked out here; the definition in words (unperforatedOnBasis) only when an output reads it.
 */
function unperforatedStrength(spec: PlateSpec, basis: EfficiencyBasis = "lesser"): { value_N: number; definition: string } {
  const m = plateStrength(spec);
  const Ag = spec.width_mm * spec.thickness_mm;
  const yield_N = Tdg(Ag, m.fy_MPa);
  const rupture_N = Tdn(Ag, m.fu_MPa);
  const value_N = valueOnBasis({ yield_N, rupture_N }, basis);
  return new UnperforatedPlate(value_N, basis, Ag, m.fy_MPa, m.fu_MPa, yield_N, rupture_N);
}

/** The unperforated strength with its definition written on first read (its value from valueOnBasis, as unperforatedOnBasis takes it). */
class UnperforatedPlate {
  #definition: string | undefined;
  constructor(
    readonly value_N: number,
    private readonly basis: EfficiencyBasis,
    private readonly Ag_mm2: number,
    private readonly fy_MPa: number,
    private readonly fu_MPa: number,
    private readonly yield_N: number,
    private readonly rupture_N: number,
  ) {}
  get definition(): string {
    if (this.#definition === undefined) this.#definition = this.written();
    return this.#definition;
  }
  private written(): string {
    const { Ag_mm2: Ag, fy_MPa: fy, fu_MPa: fu } = this;
    const { gamma_m0, gamma_m1 } = PARTIAL_FACTORS;
    const terms = {
      yield_N: this.yield_N,
      rupture_N: this.rupture_N,
      yieldSymbols: "Ag·fy/γm0",
      yieldNumbers: () => `${f(Ag)} × ${fy}/${gamma_m0}`,
      ruptureSymbols: "0.9·Ag·fu/γm1",
      ruptureNumbers: () => `0.9 × ${f(Ag)} × ${fu}/${gamma_m1}`,
    };
    return unperforatedOnBasis(terms, this.basis, (n) => kN(n)).definition;
  }
}

export const IS800_2007: DesignCode = {
  id: "is800-2007",
  title: "IS 800:2007 General construction in steel — limit state method",
  grades: GRADES,
  // The IS 1364 / IS 3757 sizes of the design aids; M18 (a second-choice size) is not covered.
  boltSizes_mm: [12, 16, 20, 22, 24, 27, 30, 36],
  holeDimensions,
  plateStrength,
  scopeErrors,
  checkJoint,
  unperforatedStrength,
  searchLimits,
  strengthBound,
  compression: IS800_COMPRESSION,
  minimumDesignAction: minimumDesignActionCheck,
  netStrengthPerWidth: (spec) => Tdn(spec.thickness_mm, plateStrength(spec).fu_MPa),
  classesFor: (assembly) => (assembly === "friction-grip" ? ["8.8", "10.9"] : PROPERTY_CLASSES),
};
