/**
 * EN 1993-1-8:2005 (design of joints) with EN 1993-1-1:2005 (members in tension) as a design-code
 * module. The module object is bound to one scenario's settings (partial factors, steel-strength
 * convention, M12/M14 clearance, category), because some DesignCode methods see only a plate or a bolt
 * size; `EN1993_1_8` is bound to the recommended values and `settings.bind(scenario)` gives the others.
 */
import { BOLT_SIZES_MM, PROPERTY_CLASSES } from "../../catalogue/bolts.js";
import { mapped } from "../../model/lists.js";
import { en10025Grade, EN10025_NAMES, EN10025_THICKNESS_RANGE } from "../../catalogue/steels.js";
import type { Joint, PlatePiece } from "../../model/joint.js";
import type { CheckResult, Warning } from "../../model/results.js";
import type { CheckableScenario, EfficiencyBasis, PlateSpec, Scenario } from "../../model/scenario.js";
import { unperforatedOnBasis, type UnperforatedTerms } from "../efficiency.js";
import { blockShearConvention } from "../../geometry/block-shear.js";
import { f, kN } from "../format.js";
import { groupLabel } from "../is800-2007/joint-checks.js";
import type { CheckScope, CodeChecks, DesignCode, ScopeError } from "../types.js";
import { boltChecksOnly, codeChecks } from "../check-builders.js";
import { holeDimensions } from "./holes.js";
import {
  bearingCheck,
  blockTearingCheck,
  boltShearCheck,
  grossYieldCheck,
  groupOf,
  JointMeasures,
  netSectionCheck,
  slipCheck,
  smallHoleConditionCheck,
  type Ec3Group,
} from "./joint-checks.js";
import { plateStrength } from "./materials.js";
import { Npl_Rd, Nnet_Rd, Nu_Rd } from "./members.js";
import { searchLimits, strengthBound } from "./search-bounds.js";
import { en1993Compression } from "./compression-splice.js";
import { categoryOf, factorsText, RECOMMENDED_FACTORS, settingsMatch, settingsOf, type Ec3Settings } from "./settings.js";
import { centroidRule, maxRules, minEndEdgeRules, minSpacingRules } from "./spacing.js";

export const EN1993_ID = "en1993-1-8";

/** Inputs EN 1993-1-8 cannot check, each with its scenario path. */
function scopeErrors(scenario: Scenario): ScopeError[] {
  const errors: ScopeError[] = [];
  const s = settingsOf(scenario);
  const range = EN10025_THICKNESS_RANGE[s.steel];
  const tooThick = (t: number) =>
    `${t} mm is thicker than ${range.max_mm} mm, the last thickness band of ${s.steel === "en10025-2" ? "the EN 10025-2 values catalogued here" : "EN 1993-1-1 Table 3.1"} (options.steel_strengths)`;
  const plates: Array<[string, PlateSpec]> = [
    ["plates.main", scenario.plates.mainA],
    ["plates.main_b", scenario.plates.mainB],
    ...scenario.plates.covers.map((c, i): [string, PlateSpec] => [i === 0 ? "plates.cover" : "plates.cover_b", c]),
  ];
  for (const [path, spec] of plates) {
    if (!en10025Grade(spec.grade)) errors.push({ path: `${path}.grade`, message: `unknown EN 10025 grade "${spec.grade}" (known: ${EN10025_NAMES.join(", ")})` });
    else if (spec.thickness_mm > range.max_mm) errors.push({ path: `${path}.thickness`, message: tooThick(spec.thickness_mm) });
  }
  (scenario.search?.coverThicknesses_mm ?? []).forEach((t, i) => {
    if (t > range.max_mm) errors.push({ path: `search.cover_thicknesses[${i}]`, message: tooThick(t) });
  });
  if (scenario.options.boltNetArea !== "iso-stress-area") {
    errors.push({ path: "options.bolt_net_area", message: "EN 1993-1-8 Table 3.4 uses the tensile stress area As: iso-stress-area (or leave it out)" });
  }
  if (scenario.options.boltStrength !== "nominal") {
    errors.push({ path: "options.bolt_strength", message: "EN 1993-1-8 Table 3.1 gives the nominal fub: nominal (or leave it out)" });
  }
  const bolts = scenario.bolts;
  if (bolts) {
    if ((bolts.hole === "short-slot" || bolts.hole === "long-slot") && bolts.slotDirection === "along") {
      errors.push({ path: "bolts.slot_direction", message: "EN 1993-1-8 Table 3.4 gives no bearing resistance for slots along the force; slots across the force only" });
    }
    if (scenario.options.smallBoltClearance_mm === 2 && bolts.hole !== "standard") {
      errors.push({ path: "options.small_bolt_clearance", message: `applies to normal (standard) holes, not ${bolts.hole} holes` });
    }
    if (bolts.preloaded && bolts.propertyClass !== "8.8" && bolts.propertyClass !== "10.9") {
      errors.push({ path: "bolts.class", message: `preloaded bolts must be class 8.8 or 10.9 (EN 1993-1-8, 3.1.2(1)), got ${bolts.propertyClass}` });
    }
    if (bolts.assembly === "friction-grip") {
      if (bolts.propertyClass !== "8.8" && bolts.propertyClass !== "10.9") {
        errors.push({ path: "bolts.class", message: `preloaded bolts must be class 8.8 or 10.9 (EN 1993-1-8, 3.1.2(1)), got ${bolts.propertyClass}` });
      }
      if (bolts.slipFactor === undefined) errors.push({ path: "bolts.slip_factor", message: "required for preloaded bolts: μ of EN 1993-1-8 Table 3.7 (class A 0.5, B 0.4, C 0.3, D 0.2)" });
      else if (bolts.slipFactor > 0.5) errors.push({ path: "bolts.slip_factor", message: `${bolts.slipFactor} exceeds 0.5, the highest slip factor of EN 1993-1-8 Table 3.7 (class A)` });
      if (bolts.slipAt !== "ultimate" && scenario.load.factoredCompression_N !== undefined && scenario.load.serviceCompression_N === undefined) {
        errors.push({ path: "load.service_compression", message: "required for Category B (slip at service, bolts.slip_at: service) when the splice carries compression" });
      }
      if (bolts.slipAt !== "ultimate" && scenario.load.factoredTension_N > 0 && scenario.load.serviceTension_N === undefined) {
        errors.push({ path: "load.service_tension", message: "required for Category B (slip at service, bolts.slip_at: service): the slip check uses the service tension" });
      }
    }
  }
  return errors;
}

function warningsOf(joint: Joint, s: Ec3Settings, groups: Ec3Group[]): Warning[] {
  const warnings: Warning[] = [];
  for (const g of groups) {
    if (g.beta_Lf >= 1 && g.beta_p >= 1 && !g.oneLineLap) continue; // no warning: no label written
    const label = groupLabel(joint, g.group);
    if (g.beta_Lf < 1 && s.category !== "C") warnings.push({ id: "long-joint", message: `${label}: long joint, Lj = ${f(g.Lj_mm)} mm > 15d: βLf = ${f(g.beta_Lf, 3)} (3.8)${g.beta_Lf <= 0.75 + 1e-9 ? " — at its floor of 0.75" : ""}` });
    if (g.beta_p < 1 && s.category !== "C") warnings.push({ id: "packing", message: `${label}: packing ${f(g.group.packing_mm)} mm > d/3: βp = ${f(g.beta_p, 3)} applied (3.6.1(12))` });
    if (g.oneLineLap) warnings.push({ id: "single-lap-one-line", message: `${label}: one transverse line of bolts in single shear — washers under both the head and the nut, Fb,Rd ≤ 1.5·fu·d·t/γM2 (3.6.1(10))` });
  }
  if (joint.spliceType === "lap" || joint.spliceType === "butt-single-cover") {
    warnings.push({
      id: "eccentric-single-shear",
      message: `${joint.spliceType === "lap" ? "lap splice" : "single-cover butt splice"}: the load path is eccentric through the plate thickness; the plates bend at the joint ends — not covered by the checks`,
    });
  }
  return warnings;
}

function conventionsOf(scenario: CheckableScenario, s: Ec3Settings, smallHoles: boolean): string[] {
  const category = { A: "Category A, bearing type: bolt shear and bearing at the factored load", B: "Category B, slip-resistant at service: slip (γM3,ser) at the service tension; bolt shear and bearing at the factored load", C: "Category C, slip-resistant at the factored load: slip (γM3) and bearing at the factored load; net section Anet·fy/γM0 (EN 1993-1-1 6.2.3(4)); no bolt-shear check (Table 3.2)" }[s.category];
  return [
    factorsText(s.factors),
    `plate fy, fu: ${s.steel === "en10025-2" ? "the product standard by thickness (EN 10025-2; S460 EN 10025-3, -4, -6)" : "EN 1993-1-1 Table 3.1"} (EN 1993-1-1 3.2.1; options.steel_strengths)`,
    "bolts: nominal fub of EN 1993-1-8 Table 3.1; A = As (ISO 898-1 stress area) where the shear planes pass the threads, π d²/4 where they pass the shank",
    `holes: clearances of EN 1090-2 Table 11${smallHoles ? "; M12/M14 in 2 mm clearance holes (3.6.1(5): Fv,Rd × 0.85 for 8.8 and 10.9; allowed only where bearing governs, checked bolt by bolt: Fb,Rd ≤ Fv,Rd)" : ""}`,
    category,
    "bearing: Fb,Rd per bolt from its own coordinates — end bolts (none ahead in their strip toward the plate end) αd = e1/3d0, others p1/3d0 − 1/4; edge bolts (on an outermost gauge line) k1 from e2 and p2, others from p2, p2 the distance to the nearest other gauge line; group by 3.7",
    scenario.options.netSectionLoad === "transferred"
      ? "net section: load already transferred — each path carries only the load its plate has not yet passed to bolts ahead of it (a scenario switch; EN 1993-1-1 6.2.3 is silent)"
      : "net section: the whole plate force on every path (EN 1993-1-1 6.2.3 as written), staggered paths by 6.2.2.2",
    `${blockShearConvention(scenario.options.blockShearLoad, "block tearing (3.10.2(2))")}; every block loaded concentrically (Veff,1,Rd)`,
    scenario.options.exposedToCorrosion
      ? "Table 3.3 maxima for members exposed to corrosion: e ≤ 4t + 40, p1,0 ≤ min(14t, 200), p1,i ≤ min(28t, 400), p2 ≤ min(14t, 200), t the thinner outer part"
      : "not exposed to corrosion: Table 3.3 sets no maximum spacing, end or edge distance for tension members (note 1)",
    "holes drilled; each bolt of a group carries an equal share (3.7)",
  ];
}

/**
 * The bolt-group checks: slip (Categories B and C, 3.9.1) and bolt shear (Categories A and B, 3.6.1,
 * Table 3.4) per group, with the small-hole condition (3.6.1(5)) where it applies; bearing per plate and
 * group (3.7, Table 3.4).
 */
function boltGroupChecks(joint: Joint, scenario: CheckableScenario, s: Ec3Settings, groups: readonly Ec3Group[], loaded: readonly PlatePiece[], measures: JointMeasures): CheckResult[] {
  const checks: CheckResult[] = [];
  for (const g of groups) {
    if (s.category !== "A") checks.push(slipCheck(joint, scenario, s, g));
    if (s.category !== "C") checks.push(boltShearCheck(joint, scenario, s, g));
    if (g.inSmallHoles) checks.push(smallHoleConditionCheck(joint, scenario, s, g, measures));
  }
  for (const plate of loaded) {
    for (const c of plate.connections) checks.push(bearingCheck(joint, scenario, s, plate, c, groupFor(groups, c.group), measures));
  }
  return checks;
}

/** The plate checks per loaded plate: gross yield and net section (EN 1993-1-1 6.2.3(2), 6.2.3(4) in Category C), block tearing per group (3.10.2(2)). */
function plateChecks(joint: Joint, scenario: CheckableScenario, s: Ec3Settings, loaded: readonly PlatePiece[], measures: JointMeasures): CheckResult[] {
  const checks: CheckResult[] = [];
  for (const plate of loaded) {
    checks.push(grossYieldCheck(scenario, s, plate));
    checks.push(netSectionCheck(joint, scenario, s, plate));
    for (const c of plate.connections) {
      const block = blockTearingCheck(joint, scenario, s, plate, c, measures);
      if (block) checks.push(block);
    }
  }
  return checks;
}

/** The group of the given id (every connection's group is one of the joint's). */
function groupFor(groups: readonly Ec3Group[], id: Ec3Group["group"]["id"]): Ec3Group {
  for (const g of groups) if (g.group.id === id) return g;
  throw new RangeError(`no bolt group ${id}`);
}

/** The design code bound to one set of settings. */
function boundCode(bound: Ec3Settings): DesignCode {
  // fy and fu by grade and thickness, looked up once (the search asks for them with every bound).
  // By grade, then thickness (no key string built per look-up).
  const strengths = new Map<string, Map<number, ReturnType<typeof plateStrength>>>();
  const strengthOf = (spec: PlateSpec) => {
    let byThickness = strengths.get(spec.grade);
    if (!byThickness) strengths.set(spec.grade, (byThickness = new Map()));
    let m = byThickness.get(spec.thickness_mm);
    if (!m) byThickness.set(spec.thickness_mm, (m = plateStrength(spec, bound.steel)));
    return m;
  };
  /**
   * The settings of one scenario: the bound ones with the scenario's own category. Categories A and B
   * change no method that sees only a plate (the unperforated and per-width net resistances change for
   * Category C only), so a code bound to either serves both; everything else must match.
   * @throws Error (a caller's bug, never a wrong answer) when the scenario needs another binding.
   */
  const settingsFor = (scenario: Scenario): Ec3Settings => {
    const category = categoryOf(scenario.bolts);
    const s = category === bound.category ? bound : { ...bound, category };
    if ((category === "C") !== (bound.category === "C") || !settingsMatch(s, scenario)) {
      throw new Error("the EN 1993-1-8 module was bound to other settings than this scenario's: bind it with settings.bind(scenario)");
    }
    return s;
  };

  function checkJoint(joint: Joint, scenario: CheckableScenario, scope: CheckScope = "all"): CodeChecks {
    const s = settingsFor(scenario);
    const groups = mapped(joint.groups, (g) => groupOf(joint, scenario, s, g));
    const measures = new JointMeasures(scenario, s);
    const loaded = joint.plates.filter((p) => p.role !== "packing");
    if (scope === "bolts") return boltChecksOnly(boltGroupChecks(joint, scenario, s, groups, loaded, measures));
    const checks: CheckResult[] = [];
    if (scope === "all") {
      for (const c of boltGroupChecks(joint, scenario, s, groups, loaded, measures)) checks.push(c);
      for (const c of plateChecks(joint, scenario, s, loaded, measures)) checks.push(c);
    }
    for (const rules of [minSpacingRules(joint), minEndEdgeRules(joint), maxRules(joint, scenario), centroidRule(joint)]) {
      for (const r of rules) checks.push(r);
    }
    const smallHoles = groups.some((g) => g.inSmallHoles);
    return codeChecks(checks, warningsOf(joint, s, groups), () => conventionsOf(scenario, s, smallHoles));
  }

  /**
   * Design tension resistance of the unperforated plate on an efficiency basis (EN 1993-1-1 6.2.3 with
   * Anet = A): Npl,Rd = A·fy/γM0, Nu,Rd = 0.9·A·fu/γM2, or the lesser. For Category C, whose net section
   * is Anet·fy/γM0, the lesser is min(Npl,Rd, Nnet,Rd with Anet = A) = A·fy/γM0; on the rupture basis
   * efficiency may then exceed 1.
   */
  function unperforatedStrength(spec: PlateSpec, basis: EfficiencyBasis = "lesser"): { value_N: number; definition: string } {
    const m = strengthOf(spec);
    const A = spec.width_mm * spec.thickness_mm;
    const { gamma_M0, gamma_M2 } = bound.factors;
    const Npl = Npl_Rd(A, m.fy_MPa, gamma_M0);
    const terms: UnperforatedTerms = {
      yield_N: Npl,
      rupture_N: Nu_Rd(A, m.fu_MPa, gamma_M2),
      yieldSymbols: "Npl,Rd = A·fy/γM0",
      yieldNumbers: () => `${f(A)} × ${m.fy_MPa}/${f(gamma_M0, 2)}`,
      ruptureSymbols: "Nu,Rd = 0.9·A·fu/γM2",
      ruptureNumbers: () => `0.9 × ${f(A)} × ${m.fu_MPa}/${f(gamma_M2, 2)}`,
    };
    if (bound.category === "C") {
      const value = Math.min(Npl, Nnet_Rd(A, m.fy_MPa, gamma_M0));
      terms.lesser = { value_N: value, text: () => `Category C: min(Npl,Rd, Nnet,Rd with Anet = A) = ${f(A)} × ${m.fy_MPa}/${f(gamma_M0, 2)}` };
    }
    return unperforatedOnBasis(terms, basis, (n) => kN(n));
  }

  return {
    id: EN1993_ID,
    title: "EN 1993-1-8:2005 Design of joints, with EN 1993-1-1:2005 (Eurocode 3)",
    grades: EN10025_NAMES,
    boltSizes_mm: BOLT_SIZES_MM,
    holeDimensions: (d, hole, slot) => holeDimensions(d, hole, slot, bound.smallBoltClearance_mm),
    plateStrength: strengthOf,
    scopeErrors,
    checkJoint,
    unperforatedStrength,
    searchLimits: (scenario, d, pattern) => searchLimits(scenario, d, pattern, settingsFor(scenario)),
    strengthBound: (scenario, shape) => strengthBound(scenario, shape, settingsFor(scenario), strengthOf),
    compression: en1993Compression(bound.factors),
    netStrengthPerWidth: (spec) => {
      const m = strengthOf(spec);
      const t = spec.thickness_mm;
      return bound.category === "C" ? Nnet_Rd(t, m.fy_MPa, bound.factors.gamma_M0) : Nu_Rd(t, m.fu_MPa, bound.factors.gamma_M2);
    },
    classesFor: (assembly) => (assembly === "friction-grip" ? ["8.8", "10.9"] : PROPERTY_CLASSES),
    settings: {
      fields: ["factors", "options.steel_strengths", "options.small_bolt_clearance"],
      optionDefaults: { boltNetArea: "iso-stress-area", boltStrength: "nominal" },
      bind: (scenario) => boundCode(settingsOf(scenario)),
    },
  };
}

/** EN 1993-1-8 with the recommended partial factors, EN 10025-2 strengths, 1 mm M12 clearance, Category A. */
export const EN1993_1_8: DesignCode = boundCode({
  factors: { ...RECOMMENDED_FACTORS },
  steel: "en10025-2",
  smallBoltClearance_mm: 1,
  category: "A",
});
