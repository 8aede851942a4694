/**
 * YAML text → typed Scenario (core units), or an InputError naming the field path and the reason.
 * No file system here: the CLI reads the file and hands over its text.
 */
import { findCode, codeIds, boundCode } from "../codes/registry.js";
import type { DesignCode } from "../codes/types.js";
import { isBoltSize, isPropertyClass, BOLT_SIZES_MM, PROPERTY_CLASSES, type PropertyClass, ASTM_BOLT_GRADES, ASTM_ISO_EQUIVALENT, astmBoltGrade, inchBoltSize, INCH_BOLT_SIZES_IN, inchSizeText } from "../catalogue/bolts.js";
import { buildJoint } from "../geometry/joint-builder.js";
import { geometryErrors } from "../geometry/validate.js";
import type { BoltSpec, CheckableScenario, DocumentInfo, EdgePreparation, HoleType, LayoutSpec, PlateSpec, Scenario } from "../model/scenario.js";
import { scenarioSchema, withInputUnits, type ScenarioFile } from "./schema.js";
import { InputError, MAX_FILE_BYTES, parseYaml } from "./yaml.js";
import { validateCosts } from "./costs.js";
import { boltTypeOf } from "./bolt-words.js";
import { parseMapping } from "./equivalents.js";
import { refuseProjectAsScenario } from "./file-kind.js";
import { PARSE_OPTIONS } from "./parse-options.js";
import type { En10025Convention } from "../catalogue/steels.js";

/** The load section: tension, compression or both (reversal), each with its service value. */
function loadOf(file: ScenarioFile): Scenario["load"] {
  const { factored_tension: T, service_tension: Ts, factored_compression: C, service_compression: Cs } = file.load;
  if (T === undefined && C === undefined) throw new InputError("load.factored_tension", "required (or load.factored_compression, or both for a load that reverses)");
  if (Ts !== undefined && T === undefined) throw new InputError("load.service_tension", "given without load.factored_tension");
  if (Cs !== undefined && C === undefined) throw new InputError("load.service_compression", "given without load.factored_compression");
  if (Ts !== undefined && T !== undefined && Ts > T) throw new InputError("load.service_tension", "exceeds the factored tension");
  if (Cs !== undefined && C !== undefined && Cs > C) throw new InputError("load.service_compression", "exceeds the factored compression");
  const load: Scenario["load"] = { factoredTension_N: T ?? 0 };
  if (Ts !== undefined) load.serviceTension_N = Ts;
  if (C !== undefined) load.factoredCompression_N = C;
  if (Cs !== undefined) load.serviceCompression_N = Cs;
  return load;
}

export { InputError, MAX_FILE_BYTES, parseYaml };

/** The value at a path of the input, or undefined where the path does not exist. */
function valueAt(value: unknown, path: ReadonlyArray<PropertyKey>): unknown {
  let v: unknown = value;
  for (const k of path) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<PropertyKey, unknown>)[k];
  }
  return v;
}

function issuePath(path: ReadonlyArray<PropertyKey>): string {
  return path.map((p) => (typeof p === "number" ? `[${p}]` : String(p))).join(".").replace(/\.\[/g, "[");
}

/** Turn a plain value into a validated file object, or throw the first problem as an InputError. */
export function validateFile(value: unknown): ScenarioFile {
  if (value === null || typeof value !== "object" || Array.isArray(value)) {
    throw new InputError("", "the scenario must be a YAML mapping of fields (name, code, splice, plates, load, ...)");
  }
  refuseProjectAsScenario(value as Record<string, unknown>);
  refuseUnitsForCode(value as Record<string, unknown>);
  const system = (value as Record<string, unknown>).units === "us" ? "us" : "si";
  const result = withInputUnits(system, () => scenarioSchema().safeParse(value, PARSE_OPTIONS));
  if (result.success) return result.data;
  // An unknown field is reported first: a misspelt required field shows up as both "unknown" and
  // "required", and the misspelling is what the engineer has to see.
  const issue = result.error.issues.find((i) => i.code === "unrecognized_keys") ?? result.error.issues[0]!;
  const path = issuePath(issue.path);
  let reason = issue.message;
  if (issue.code === "unrecognized_keys") {
    const keys = (issue as { keys?: string[] }).keys ?? [];
    throw new InputError(path ? `${path}.${keys[0] ?? ""}` : keys[0] ?? "", `unknown field (not part of the scenario format)`);
  }
  if (valueAt(value, issue.path) === undefined) reason = "required";
  throw new InputError(path, reason);
}

/** The reason a code-specific setting is refused under another code. */
function notReadBy(path: string, code: DesignCode): InputError {
  return new InputError(path, `not read by ${code.id} (a setting of ${codeIds().filter((id) => findCode(id)?.settings?.fields.includes(path)).join(", ") || "no known code"})`);
}

/**
 * `units: us` under a code that does not read it is named before any field is read: otherwise bare
 * numbers would be taken as inches and the first too-large width would be blamed instead.
 */
function refuseUnitsForCode(file: Record<string, unknown>): void {
  if (file.units !== "us" || typeof file.code !== "string") return;
  const code = findCode(file.code);
  if (code && !code.settings?.fields.includes("units")) throw notReadBy("units", code);
}

function plateSpec(p: { width: number; thickness: number; grade: string; edges: string }): PlateSpec {
  return { width_mm: p.width, thickness_mm: p.thickness, grade: p.grade, edges: p.edges as EdgePreparation };
}

/** Bolt sizes the scenario names (its bolts and its search) must be ones the code's tables cover. */
function sizeScope(scenario: Scenario, code: DesignCode): void {
  const covered = (d: number) => code.boltSizes_mm.some((c) => Math.abs(c - d) < 1e-6);
  const list = () => code.boltSizes_mm.map((d) => (inchBoltSize(d) !== undefined ? inchSizeText(inchBoltSize(d)!) : `M${d}`)).join(", ");
  if (scenario.bolts && !covered(scenario.bolts.size_mm)) throw new InputError("bolts.size", `${sizeText(scenario.bolts.size_mm)} is not covered under ${code.id} (sizes: ${list()})`);
  scenario.search?.sizes_mm?.forEach((d, i) => {
    if (!covered(d)) throw new InputError(`search.sizes[${i}]`, `${sizeText(d)} is not covered under ${code.id} (sizes: ${list()})`);
  });
}

/** A catalogue bolt size: metric (M12–M36) or inch (½–1⅛ in), mm. */
function knownSize(d_mm: number): boolean {
  return isBoltSize(d_mm) || inchBoltSize(d_mm) !== undefined;
}

function sizeText(d_mm: number): string {
  if (Number.isInteger(d_mm) || d_mm < 0.25 * 25.4) return `M${d_mm}${d_mm < 6 ? " (a bare size is mm unless units: us)" : ""}`;
  return `${(d_mm / 25.4).toFixed(4).replace(/0+$/, "")} in`;
}

const KNOWN_SIZES = `${BOLT_SIZES_MM.map((d) => `M${d}`).join(", ")}; ${INCH_BOLT_SIZES_IN.map((d) => inchSizeText(d)).join(", ")}`;

function boltSpec(b: NonNullable<ScenarioFile["bolts"]>, codeId: string): BoltSpec {
  if (!knownSize(b.size)) throw new InputError("bolts.size", `${sizeText(b.size)} is not in the catalogue (known: ${KNOWN_SIZES})`);
  const astm = astmBoltGrade(b.class);
  if (!isPropertyClass(b.class) && !astm) throw new InputError("bolts.class", `unknown property class "${b.class}" (known: ${PROPERTY_CLASSES.join(", ")}; ASTM grades ${ASTM_BOLT_GRADES.join(", ")})`);
  const meaning = boltTypeOf(b, codeId);
  if (meaning.assembly === "bearing" && (b.slip_factor !== undefined || b.slip_at !== undefined)) {
    throw new InputError(b.slip_factor !== undefined ? "bolts.slip_factor" : "bolts.slip_at", "applies to friction-grip bolts only (bolts.type: friction-grip)");
  }
  if ((b.hole === "short-slot" || b.hole === "long-slot") && !b.slot_direction) {
    throw new InputError("bolts.slot_direction", "required for slotted holes: along or across the force");
  }
  const spec: BoltSpec = {
    size_mm: b.size,
    propertyClass: astm ? ASTM_ISO_EQUIVALENT[astm] : (b.class as PropertyClass),
    assembly: meaning.assembly,
    threadsInShearPlanes: meaning.threadsInShearPlanes,
    hole: b.hole as HoleType,
  };
  if (astm) spec.astmGrade = astm;
  if (b.slip_factor !== undefined) spec.slipFactor = b.slip_factor;
  if (meaning.assembly === "friction-grip") spec.slipAt = meaning.slipAt ?? "service";
  else if (meaning.preloaded) spec.preloaded = true;
  if (b.slot_direction) spec.slotDirection = b.slot_direction;
  return spec;
}

function need<T>(value: T | undefined, path: string, why: string): T {
  if (value === undefined) throw new InputError(path, `required ${why}`);
  return value;
}

function layoutSpec(l: NonNullable<ScenarioFile["layout"]>, width_mm: number, butt: boolean): LayoutSpec {
  const endDistance = need(l.end_distance, "layout.end_distance", `for a ${l.pattern} layout`);
  const atButt = l.end_distance_at_butt ?? endDistance;
  if (!butt && l.end_distance_at_butt !== undefined) throw new InputError("layout.end_distance_at_butt", "applies to butt splices only");
  if (l.pattern === "holes") {
    for (const k of ["across", "along", "across_per_line", "pitch", "gauge", "end_distance_at_butt", "edge_distance"] as const) {
      if (l[k] !== undefined) throw new InputError(`layout.${k}`, "not used with pattern: holes (give hole coordinates instead)");
    }
    const holes = need(l.holes, "layout.holes", "for pattern: holes");
    return { kind: "holes", holes: holes.map((h) => ({ x_mm: h.x, y_mm: h.y })), endDistance_mm: endDistance };
  }
  if (l.holes !== undefined) throw new InputError("layout.holes", `not used with pattern: ${l.pattern}`);
  const pitch = l.pitch;
  if (l.pattern === "tapered") {
    if (l.across !== undefined || l.along !== undefined) throw new InputError(l.across !== undefined ? "layout.across" : "layout.along", "a tapered layout takes across_per_line instead");
    const perLine = need(l.across_per_line, "layout.across_per_line", "for a tapered layout");
    const widest = Math.max(...perLine);
    const gauge = resolveGauge(l.gauge, l.edge_distance, widest, width_mm);
    return { kind: "tapered", acrossPerLine: perLine, pitch_mm: perLine.length > 1 ? need(pitch, "layout.pitch", "with more than one transverse line") : pitch ?? 0, gauge_mm: gauge, endDistance_mm: endDistance, endDistanceAtButt_mm: atButt };
  }
  if (l.across_per_line !== undefined) throw new InputError("layout.across_per_line", `used with pattern: tapered only`);
  const across = need(l.across, "layout.across", `(bolts across the width on each transverse line)`);
  const along = need(l.along, "layout.along", `(transverse lines along the force${butt ? ", per side of the butt" : ""})`);
  if (l.pattern === "staggered") {
    if (across < 2) throw new InputError("layout.across", "a staggered pattern needs at least 2 bolts on its first transverse line");
    if (along < 2) throw new InputError("layout.along", "a staggered pattern needs at least 2 transverse lines");
    const gaugeLines = 2 * across - 1;
    const gauge = resolveGauge(l.gauge, l.edge_distance, gaugeLines, width_mm);
    return { kind: "staggered", across, along, pitch_mm: need(pitch, "layout.pitch", "(stagger pitch between transverse lines)"), gauge_mm: gauge, endDistance_mm: endDistance, endDistanceAtButt_mm: atButt };
  }
  const gauge = resolveGauge(l.gauge, l.edge_distance, across, width_mm);
  return {
    kind: "grid",
    across,
    along,
    pitch_mm: along > 1 ? need(pitch, "layout.pitch", "with more than one transverse line") : pitch ?? 0,
    gauge_mm: gauge,
    endDistance_mm: endDistance,
    endDistanceAtButt_mm: atButt,
  };
}

/**
 * Gauge from the gauge or the edge distance: the group sits on the plate axis, so
 * width = 2·edge + (gauge lines − 1)·gauge. If both are given they must agree.
 */
function resolveGauge(gauge: number | undefined, edge: number | undefined, gaugeLines: number, width_mm: number): number {
  if (gaugeLines === 1) {
    if (gauge !== undefined) throw new InputError("layout.gauge", "not used with one bolt across (the bolt sits on the plate axis)");
    if (edge !== undefined && Math.abs(2 * edge - width_mm) > 0.5) {
      throw new InputError("layout.edge_distance", `${edge} mm does not match one bolt on the axis of a ${width_mm} mm plate (edge distance ${width_mm / 2} mm)`);
    }
    return 0;
  }
  if (gauge === undefined && edge === undefined) throw new InputError("layout.gauge", "required (or give layout.edge_distance)");
  if (gauge === undefined) {
    const g = (width_mm - 2 * edge!) / (gaugeLines - 1);
    if (!(g > 0)) throw new InputError("layout.edge_distance", `${edge} mm leaves no room for ${gaugeLines} gauge lines across a ${width_mm} mm plate`);
    return g;
  }
  if (edge !== undefined) {
    const implied = (width_mm - (gaugeLines - 1) * gauge) / 2;
    if (Math.abs(implied - edge) > 0.5) {
      throw new InputError("layout.edge_distance", `${edge} mm disagrees with the gauge: ${gaugeLines} gauge lines at ${gauge} mm on a ${width_mm} mm plate leave ${implied} mm each side`);
    }
  }
  return gauge;
}

/** Validated file → Scenario in core units (without bolts/layout check). */
export function toScenario(file: ScenarioFile): { scenario: Scenario; code: DesignCode } {
  const code = findCode(file.code);
  if (!code) throw new InputError("code", `unknown design code "${file.code}" (known: ${codeIds().join(", ")})`);
  const type = file.splice.type;
  const butt = type !== "lap";
  const mainA = plateSpec(file.plates.main);
  const mainB = plateSpec(file.plates.main_b ?? file.plates.main);
  const covers: PlateSpec[] = [];
  if (butt) {
    const cover = plateSpec(need(file.plates.cover, "plates.cover", `for a ${type} splice`));
    covers.push(cover);
    if (type === "butt-double-cover") covers.push(file.plates.cover_b ? plateSpec(file.plates.cover_b) : cover);
    else if (file.plates.cover_b) throw new InputError("plates.cover_b", "a second cover plate applies to butt-double-cover splices only");
  } else {
    if (file.plates.cover) throw new InputError("plates.cover", "a lap splice has no cover plate (use splice.type: butt-single-cover or butt-double-cover)");
    if (file.plates.cover_b) throw new InputError("plates.cover_b", "a lap splice has no cover plate");
    if (file.splice.butt_gap !== undefined) throw new InputError("splice.butt_gap", "applies to butt splices only");
  }
  let packing = 0;
  if (butt) {
    const diff = Math.abs(mainA.thickness_mm - mainB.thickness_mm);
    packing = file.packing === undefined || file.packing === "auto" ? diff : file.packing;
  } else if (file.packing !== undefined && file.packing !== "auto" && file.packing > 0) {
    throw new InputError("packing", "applies to butt splices only (the plates of a lap splice bear on each other)");
  }
  const scenario: Scenario = {
    name: file.name,
    code: code.id,
    splice: { type, buttGap_mm: butt ? file.splice.butt_gap ?? 10 : 0 },
    plates: { mainA, mainB, covers },
    packing_mm: packing,
    load: loadOf(file),
    options: {
      exposedToCorrosion: file.options.exposed_to_corrosion,
      boltNetArea: file.options.bolt_net_area ?? code.settings?.optionDefaults.boltNetArea ?? "0.78-gross",
      boltStrength: file.options.bolt_strength ?? code.settings?.optionDefaults.boltStrength ?? "minimum",
      netSectionLoad: file.options.net_section_load,
      blockShearLoad: file.options.block_shear_load,
      efficiencyBasis: file.options.efficiency_basis,
    },
  };
  if (file.units === "us") scenario.units = "us";
  codeSettingsOf(file, code, scenario);
  if (file.project !== undefined) scenario.project = file.project;
  if (file.document !== undefined) scenario.document = documentInfoOf(file.document);
  if (file.costs !== undefined) scenario.costs = validateCosts(file.costs, "costs");
  if (file.compare !== undefined) scenario.compare = parseMapping(file.compare, "compare");
  if (file.splice.ends_in_contact !== undefined) {
    if (!butt) throw new InputError("splice.ends_in_contact", "applies to butt splices only (the plates of a lap splice have no butt ends)");
    if (file.load.factored_compression === undefined) throw new InputError("splice.ends_in_contact", "applies only when the splice carries compression (load.factored_compression)");
    scenario.splice.endsInContact = file.splice.ends_in_contact;
  }
  if (file.bolts) scenario.bolts = boltSpec(file.bolts, code.id);
  if (file.layout) {
    if (!file.bolts) throw new InputError("bolts", "required when a layout is given");
    const narrowest = Math.min(mainA.width_mm, mainB.width_mm, ...covers.map((c) => c.width_mm));
    scenario.layout = layoutSpec(file.layout, narrowest, butt);
  }
  if (file.search) {
    const s = file.search;
    const spec: NonNullable<Scenario["search"]> = {};
    if (s.sizes) {
      s.sizes.forEach((d, i) => {
        if (!knownSize(d)) throw new InputError(`search.sizes[${i}]`, `${sizeText(d)} is not in the catalogue`);
      });
      spec.sizes_mm = s.sizes;
    }
    if (s.classes) {
      s.classes.forEach((c, i) => {
        if (!isPropertyClass(c)) throw new InputError(`search.classes[${i}]`, `unknown property class "${c}"`);
      });
      spec.classes = s.classes as PropertyClass[];
    }
    if (s.step !== undefined) spec.step_mm = s.step;
    if (s.patterns !== undefined) spec.patterns = [...new Set(s.patterns)];
    if (s.max_along !== undefined) spec.maxAlong = s.max_along;
    if (s.min_bolts !== undefined) spec.minBolts = s.min_bolts;
    if (s.max_splice_length !== undefined) spec.maxSpliceLength_mm = s.max_splice_length;
    if (s.max_end_distance !== undefined) spec.maxEndDistance_mm = s.max_end_distance;
    if (s.max_across !== undefined) spec.maxAcross = s.max_across;
    if (s.min_across !== undefined) {
      if (s.max_across !== undefined && s.min_across > s.max_across) throw new InputError("search.min_across", `${s.min_across} is more than search.max_across (${s.max_across})`);
      spec.minAcross = s.min_across;
    }
    if (s.gauge !== undefined) spec.fixedGauge_mm = s.gauge;
    if (s.cover_thicknesses !== undefined) {
      if (!butt) throw new InputError("search.cover_thicknesses", "applies to butt splices only");
      spec.coverThicknesses_mm = s.cover_thicknesses;
    }
    scenario.search = spec;
  }
  sizeScope(scenario, code);
  const scope = code.scopeErrors(scenario)[0];
  if (scope) throw new InputError(scope.path, scope.message);
  return { scenario, code: boundCode(code, scenario) };
}

/**
 * The settings only some codes read (partial factors, the steel-strength convention, the M12/M14
 * clearance): carried onto the scenario for a code that reads them, refused for any other code rather
 * than ignored.
 */
function codeSettingsOf(file: ScenarioFile, code: DesignCode, scenario: Scenario): void {
  const given: Array<[string, boolean]> = [
    ["factors", file.factors !== undefined],
    ["options.steel_strengths", file.options.steel_strengths !== undefined],
    ["options.small_bolt_clearance", file.options.small_bolt_clearance !== undefined],
    ["units", file.units === "us"],
    ["options.bearing_deformation", file.options.bearing_deformation !== undefined],
    ["options.fillers_developed", file.options.fillers_developed !== undefined],
  ];
  if (file.bolts && astmBoltGrade(file.bolts.class) && !code.settings?.fields.includes("bolts.class (ASTM grade)")) {
    throw new InputError("bolts.class", `ASTM grade ${file.bolts.class} is not read by ${code.id} (a bolt grade of ${codeIds().filter((id) => findCode(id)?.settings?.fields.includes("bolts.class (ASTM grade)")).join(", ")}; use an ISO 898-1 class)`);
  }
  for (const [path, present] of given) {
    if (present && !code.settings?.fields.includes(path)) throw notReadBy(path, code);
  }
  if (file.options.steel_strengths !== undefined) scenario.options.steelStrengths = file.options.steel_strengths as En10025Convention;
  if (file.options.bearing_deformation !== undefined) scenario.options.bearingDeformation = file.options.bearing_deformation;
  if (file.options.fillers_developed !== undefined) scenario.options.fillersDeveloped = file.options.fillers_developed;
  if (file.options.small_bolt_clearance !== undefined) scenario.options.smallBoltClearance_mm = file.options.small_bolt_clearance as 1 | 2;
  if (file.factors) {
    const f = file.factors;
    const factors: NonNullable<Scenario["factors"]> = {};
    if (f.gamma_m0 !== undefined) factors.gammaM0 = f.gamma_m0;
    if (f.gamma_m1 !== undefined) factors.gammaM1 = f.gamma_m1;
    if (f.gamma_m2 !== undefined) factors.gammaM2 = f.gamma_m2;
    if (f.gamma_m3 !== undefined) factors.gammaM3 = f.gamma_m3;
    if (f.gamma_m3_ser !== undefined) factors.gammaM3ser = f.gamma_m3_ser;
    scenario.factors = factors;
  }
}

/** Parse and validate a scenario's text completely. */
export function parseScenario(text: string): { scenario: Scenario; code: DesignCode } {
  return toScenario(validateFile(parseYaml(text)));
}

/** The scenario as `check` needs it: bolts and layout present, and a geometry that fits the plates. */
export function requireCheckable(scenario: Scenario, code: DesignCode): CheckableScenario {
  if (!scenario.bolts) throw new InputError("bolts", "required for check (a scenario without bolts and layout is for search)");
  if (!scenario.layout) throw new InputError("layout", "required for check (a scenario without a layout is for search)");
  const checkable = scenario as CheckableScenario;
  const problem = geometryErrors(buildJoint(checkable, code))[0];
  if (problem) throw new InputError(problem.path, problem.message);
  return checkable;
}

/** The document block in the core's names; absent fields stay absent. */
function documentInfoOf(d: NonNullable<ScenarioFile["document"]>): DocumentInfo {
  const info: DocumentInfo = {};
  if (d.job !== undefined) info.job = d.job;
  if (d.drawing_number !== undefined) info.drawingNumber = d.drawing_number;
  if (d.calculation_number !== undefined) info.calculationNumber = d.calculation_number;
  if (d.revision !== undefined) info.revision = d.revision;
  if (d.drawn_by !== undefined) info.drawnBy = d.drawn_by;
  if (d.prepared_by !== undefined) info.preparedBy = d.prepared_by;
  if (d.checked_by !== undefined) info.checkedBy = d.checked_by;
  if (d.date !== undefined) info.date = d.date;
  return info;
}
