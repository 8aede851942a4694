/**
 * The workbench form: every field of the scenario file, by its path in the file, with its label in
 * the code's own words, the kind of input and when it applies. Pure data and small conversions
 * between a field's text and the file's value; no DOM, no formula. The file's own schema
 * (src/io/schema.ts) validates whatever the form writes, so the form and the CLI share one set of
 * defaults and messages.
 */

export type CodeId = "is800-2007" | "en1993-1-8" | "aisc360-16";
export const CODE_IDS: readonly CodeId[] = ["is800-2007", "en1993-1-8", "aisc360-16"];
export const CODE_TITLES: Record<CodeId, string> = {
  "is800-2007": "IS 800:2007 (limit state method)",
  "en1993-1-8": "EN 1993-1-8:2005 (Eurocode 3)",
  "aisc360-16": "AISC 360-16 (LRFD)",
};

/** A label: one text, or one per code where the codes use their own words. */
export type Words = string | Record<CodeId, string>;

export type Quantity = "length" | "force";

export interface Choice {
  value: string | number;
  text: Words;
}

/** What the form reads to decide which fields apply. */
export interface FieldContext {
  /** The scenario as a plain value (the YAML document's content). */
  file: Record<string, unknown>;
  /** The design code the `code` field resolves to, if it does. */
  codeId: CodeId | undefined;
}

interface Base {
  /** Path in the scenario file. */
  path: readonly string[];
  label: Words;
  /** Short help beside the field: clause, meaning, what a blank means. */
  hint?: Words;
  /** Whether the field applies; a field that holds a value is shown whatever this says. */
  when?: (c: FieldContext) => boolean;
}

export type Field =
  | (Base & { kind: "text"; suggestions?: Suggestions })
  | (Base & { kind: "quantity"; quantity: Quantity; blank?: Words })
  | (Base & { kind: "number"; blank?: Words })
  | (Base & { kind: "count"; blank?: Words })
  | (Base & { kind: "choice"; choices: readonly Choice[]; blank?: Words })
  | (Base & { kind: "flag"; blank: boolean })
  | (Base & { kind: "list"; items: "number" | "text"; blank?: Words; suggestions?: Suggestions })
  | (Base & { kind: "points" })
  | (Base & { kind: "prices" })
  | (Base & { kind: "equivalents" });

/** Catalogue names offered as suggestions (the worker sends them per code). */
export type Suggestions = "grades" | "sizes" | "classes";

export interface Section {
  id: string;
  title: Words;
  /** Folded away unless it holds a value. */
  folded?: boolean;
  when?: (c: FieldContext) => boolean;
  fields: Field[];
}

const at = (file: Record<string, unknown>, path: readonly string[]): unknown => {
  let v: unknown = file;
  for (const k of path) {
    if (v === null || typeof v !== "object" || Array.isArray(v)) return undefined;
    v = (v as Record<string, unknown>)[k];
  }
  return v;
};

/** The file's value at a path. */
export const valueAt = at;

const str = (c: FieldContext, path: readonly string[]) => {
  const v = at(c.file, path);
  return typeof v === "string" ? v : undefined;
};
const butt = (c: FieldContext) => str(c, ["splice", "type"]) !== "lap";
const doubleCover = (c: FieldContext) => str(c, ["splice", "type"]) === "butt-double-cover";
/** Friction-grip bolts in the shared spelling or the code's own words (src/io/bolt-words.ts). */
const frictionGrip = (c: FieldContext) =>
  str(c, ["bolts", "type"]) === "friction-grip" || ["B", "C"].includes(str(c, ["bolts", "category"]) ?? "") || str(c, ["bolts", "joint"]) === "slip-critical" || at(c.file, ["bolts", "preloaded"]) === true;
const pattern = (...p: string[]) => (c: FieldContext) => p.includes(str(c, ["layout", "pattern"]) ?? "");
const code = (...ids: CodeId[]) => (c: FieldContext) => c.codeId !== undefined && ids.includes(c.codeId);
const slotted = (c: FieldContext) => ["short-slot", "long-slot"].includes(str(c, ["bolts", "hole"]) ?? "");

const EDGES: Choice[] = [
  { value: "rolled", text: "rolled" },
  { value: "machine-flame-cut", text: "machine flame cut" },
  { value: "sawn", text: "sawn" },
  { value: "planed", text: "planed" },
  { value: "sheared", text: "sheared" },
  { value: "hand-flame-cut", text: "hand flame cut" },
];

const GRADE: Words = { "is800-2007": "Steel grade (IS 2062)", "en1993-1-8": "Steel grade (EN 10025-2)", "aisc360-16": "Steel (ASTM)" };

function plateFields(key: string): Field[] {
  const p = ["plates", key];
  return [
    { path: [...p, "width"], kind: "quantity", quantity: "length", label: "Width" },
    { path: [...p, "thickness"], kind: "quantity", quantity: "length", label: "Thickness" },
    { path: [...p, "grade"], kind: "text", label: GRADE, suggestions: "grades" },
    { path: [...p, "edges"], kind: "choice", label: "Edges", choices: EDGES, blank: "rolled", hint: { "is800-2007": "sets the minimum edge distance, cl. 10.2.4.2", "en1993-1-8": "recorded; EN 1993-1-8 Table 3.3 does not vary with it", "aisc360-16": "recorded; AISC 360-16 J3.4 does not vary with it" } },
  ];
}

const HOLES: Choice[] = [
  { value: "standard", text: { "is800-2007": "standard clearance", "en1993-1-8": "normal round", "aisc360-16": "standard (STD)" } },
  { value: "oversize", text: { "is800-2007": "oversize", "en1993-1-8": "oversized", "aisc360-16": "oversized (OVS)" } },
  { value: "short-slot", text: { "is800-2007": "short slotted", "en1993-1-8": "short slotted", "aisc360-16": "short-slotted (SSL)" } },
  { value: "long-slot", text: { "is800-2007": "long slotted", "en1993-1-8": "long slotted", "aisc360-16": "long-slotted (LSL)" } },
];

export const SECTIONS: readonly Section[] = [
  {
    id: "scenario",
    title: "Scenario",
    fields: [
      { path: ["name"], kind: "text", label: "Name", hint: "printed on the sheet and the drawing" },
      { path: ["project"], kind: "text", label: "Project" },
      { path: ["document", "job"], kind: "text", label: "Job number", hint: "title block and report sign-off" },
      { path: ["document", "drawing_number"], kind: "text", label: "Drawing number" },
      { path: ["document", "calculation_number"], kind: "text", label: "Calculation number" },
      { path: ["document", "revision"], kind: "text", label: "Revision" },
      { path: ["document", "drawn_by"], kind: "text", label: "Drawn by" },
      { path: ["document", "prepared_by"], kind: "text", label: "Prepared by" },
      { path: ["document", "checked_by"], kind: "text", label: "Checked by" },
      { path: ["document", "date"], kind: "text", label: "Document date", hint: "as the office writes it; the run's date when blank" },
      {
        path: ["code"],
        kind: "choice",
        label: "Design code",
        choices: CODE_IDS.map((id) => ({ value: id, text: CODE_TITLES[id] })),
      },
      { path: ["units"], kind: "choice", label: "Units of bare numbers", choices: [{ value: "si", text: "SI: mm, kN" }, { value: "us", text: "US customary: in, kip" }], blank: "SI: mm, kN", when: code("aisc360-16") },
    ],
  },
  {
    id: "splice",
    title: "Splice",
    fields: [
      {
        path: ["splice", "type"],
        kind: "choice",
        label: "Type",
        choices: [
          { value: "lap", text: "lap splice (single shear)" },
          { value: "butt-single-cover", text: "butt splice, one cover plate (single shear)" },
          { value: "butt-double-cover", text: "butt splice, two cover plates (double shear)" },
        ],
      },
      { path: ["splice", "butt_gap"], kind: "quantity", quantity: "length", label: "Gap between the main plate ends", blank: "10 mm", when: butt },
      { path: ["splice", "ends_in_contact"], kind: "flag", label: "Butt ends in contact (prepared for bearing)", blank: false, hint: "compression only: what the code lets the contact carry; by default the bolts and covers carry it all", when: butt },
      { path: ["packing"], kind: "text", label: "Packing", hint: "a thickness, or auto: the difference of the main plate thicknesses (the default for butt splices)", when: butt },
    ],
  },
  { id: "main", title: "Main plate", fields: plateFields("main") },
  { id: "main_b", title: "Second main plate, where it differs", folded: true, fields: plateFields("main_b") },
  { id: "cover", title: "Cover plate", when: butt, fields: plateFields("cover") },
  { id: "cover_b", title: "Second cover plate, where it differs", folded: true, when: doubleCover, fields: plateFields("cover_b") },
  {
    id: "load",
    title: "Load",
    fields: [
      { path: ["load", "factored_tension"], kind: "quantity", quantity: "force", label: { "is800-2007": "Factored tension T", "en1993-1-8": "Design tension NEd", "aisc360-16": "Required tensile strength Pu (LRFD)" } },
      {
        path: ["load", "service_tension"],
        kind: "quantity",
        quantity: "force",
        label: { "is800-2007": "Service tension", "en1993-1-8": "Serviceability tension NEd,ser", "aisc360-16": "Service tension" },
        hint: { "is800-2007": "needed for friction-grip bolts designed against slip at service", "en1993-1-8": "needed for Category B (slip-resistant at serviceability)", "aisc360-16": "optional" },
      },
      {
        path: ["load", "factored_compression"],
        kind: "quantity",
        quantity: "force",
        label: { "is800-2007": "Factored compression", "en1993-1-8": "Design compression NEd", "aisc360-16": "Required compressive strength Pu (LRFD)" },
        hint: "with a tension too, the load reverses: every check runs for each sense",
      },
      {
        path: ["load", "service_compression"],
        kind: "quantity",
        quantity: "force",
        label: { "is800-2007": "Service compression", "en1993-1-8": "Serviceability compression NEd,ser", "aisc360-16": "Service compression" },
        hint: "needed where slip is checked at serviceability and the splice carries compression",
      },
    ],
  },
  {
    id: "bolts",
    title: "Bolts",
    fields: [
      { path: ["bolts", "size"], kind: "text", label: "Size", suggestions: "sizes", hint: "leave the bolts and layout blank to search for them" },
      { path: ["bolts", "class"], kind: "text", label: { "is800-2007": "Property class (IS 1367-3 / ISO 898-1)", "en1993-1-8": "Bolt class (EN ISO 898-1)", "aisc360-16": "Bolt grade (ASTM F3125, A307; or an ISO class for metric bolts)" }, suggestions: "classes" },
      {
        path: ["bolts", "type"],
        kind: "choice",
        label: "Assembly",
        choices: [
          { value: "bearing", text: { "is800-2007": "bearing type", "en1993-1-8": "bearing type (Category A)", "aisc360-16": "bearing-type" } },
          { value: "friction-grip", text: { "is800-2007": "friction grip (HSFG)", "en1993-1-8": "preloaded, slip-resistant (Category B or C)", "aisc360-16": "slip-critical" } },
        ],
        blank: { "is800-2007": "bearing type", "en1993-1-8": "bearing type (Category A)", "aisc360-16": "bearing-type" },
      },
      {
        path: ["bolts", "category"],
        kind: "choice",
        label: "Category (EN 1993-1-8 3.4.1)",
        choices: [
          { value: "A", text: "A: bearing type" },
          { value: "B", text: "B: slip-resistant at serviceability" },
          { value: "C", text: "C: slip-resistant at ultimate" },
        ],
        blank: "from the assembly",
        when: code("en1993-1-8"),
      },
      { path: ["bolts", "preloaded"], kind: "flag", blank: false, label: "Preloaded bolts in Category A (3.1.2)", when: (c) => code("en1993-1-8")(c) && str(c, ["bolts", "category"]) === "A" },
      {
        path: ["bolts", "joint"],
        kind: "choice",
        label: "Joint (AISC 360-16 J3.1, J3.8)",
        choices: [
          { value: "snug-tight", text: "snug-tight" },
          { value: "pretensioned", text: "pretensioned" },
          { value: "slip-critical", text: "slip-critical" },
        ],
        blank: "from the assembly",
        when: code("aisc360-16"),
      },
      {
        path: ["bolts", "threads"],
        kind: "choice",
        label: "Threads (Table J3.2)",
        choices: [
          { value: "N", text: "N: not excluded from the shear planes" },
          { value: "X", text: "X: excluded from the shear planes" },
        ],
        blank: "from the threads flag",
        when: code("aisc360-16"),
      },
      { path: ["bolts", "slip_factor"], kind: "number", label: { "is800-2007": "Slip factor μf (Table 20)", "en1993-1-8": "Slip factor μ (Table 3.7)", "aisc360-16": "Mean slip coefficient μ (J3.8)" }, when: frictionGrip },
      {
        path: ["bolts", "slip_at"],
        kind: "choice",
        label: "Slip checked at",
        choices: [
          { value: "service", text: { "is800-2007": "service load (γmf 1.10)", "en1993-1-8": "serviceability (Category B)", "aisc360-16": "service" } },
          { value: "ultimate", text: { "is800-2007": "factored load (γmf 1.25)", "en1993-1-8": "ultimate (Category C)", "aisc360-16": "factored load" } },
        ],
        blank: "service",
        when: frictionGrip,
      },
      { path: ["bolts", "threads_in_shear_planes"], kind: "flag", blank: true, when: (c) => str(c, ["bolts", "threads"]) === undefined, label: { "is800-2007": "Threads in the shear planes", "en1993-1-8": "Shear planes through the threaded portion", "aisc360-16": "Threads not excluded from the shear planes (N)" } },
      { path: ["bolts", "hole"], kind: "choice", label: "Holes", choices: HOLES, blank: { "is800-2007": "standard clearance", "en1993-1-8": "normal round", "aisc360-16": "standard (STD)" } },
      { path: ["bolts", "slot_direction"], kind: "choice", label: "Slots run", choices: [{ value: "along", text: "along the force" }, { value: "across", text: "across the force" }], when: slotted },
    ],
  },
  {
    id: "layout",
    title: "Bolt layout (per side of the butt for butt splices)",
    fields: [
      {
        path: ["layout", "pattern"],
        kind: "choice",
        label: "Pattern",
        choices: [
          { value: "grid", text: "grid" },
          { value: "staggered", text: "staggered" },
          { value: "tapered", text: "tapered (counts per transverse line)" },
          { value: "holes", text: "hole coordinates" },
        ],
      },
      { path: ["layout", "across"], kind: "count", label: "Bolts across (on each transverse line)", when: pattern("grid", "staggered") },
      { path: ["layout", "along"], kind: "count", label: "Transverse lines along the force", when: pattern("grid", "staggered") },
      { path: ["layout", "across_per_line"], kind: "list", items: "number", label: "Bolts across, line by line from the butt", when: pattern("tapered") },
      { path: ["layout", "pitch"], kind: "quantity", quantity: "length", label: "Pitch p (along the force)", when: pattern("grid", "staggered", "tapered") },
      { path: ["layout", "gauge"], kind: "quantity", quantity: "length", label: "Gauge g (across the force)", when: pattern("grid", "staggered", "tapered") },
      { path: ["layout", "end_distance"], kind: "quantity", quantity: "length", label: { "is800-2007": "End distance e", "en1993-1-8": "End distance e1", "aisc360-16": "End distance Le" } },
      { path: ["layout", "end_distance_at_butt"], kind: "quantity", quantity: "length", label: "End distance at the butt", blank: "the end distance", when: (c) => butt(c) && !pattern("holes")(c) },
      { path: ["layout", "edge_distance"], kind: "quantity", quantity: "length", label: { "is800-2007": "Edge distance", "en1993-1-8": "Edge distance e2", "aisc360-16": "Edge distance" }, hint: "optional: checked against the width and gauge (the group sits on the plate axis)", when: pattern("grid", "staggered", "tapered") },
      { path: ["layout", "holes"], kind: "points", label: "Hole centres x, y (one hole a line)", hint: "x along the force from the end of main plate B (lap: plate B), y across from the plate axis", when: pattern("holes") },
    ],
  },
  {
    id: "search",
    title: "Search space",
    folded: true,
    fields: [
      { path: ["search", "sizes"], kind: "list", items: "text", label: "Bolt sizes", blank: "every size the prices cover", suggestions: "sizes" },
      { path: ["search", "classes"], kind: "list", items: "text", label: "Classes", blank: "4.6, 5.6, 8.8, 10.9 (friction grip: 8.8, 10.9)", suggestions: "classes" },
      { path: ["search", "patterns"], kind: "list", items: "text", label: "Patterns", blank: "grid, staggered, tapered" },
      { path: ["search", "step"], kind: "quantity", quantity: "length", label: "Fabrication step for pitch, gauge and end distances", blank: "5 mm" },
      { path: ["search", "max_along"], kind: "count", label: "Most transverse lines (per side)", blank: "12" },
      { path: ["search", "min_bolts"], kind: "count", label: "Fewest bolts per group", blank: "2" },
      { path: ["search", "max_across"], kind: "count", label: "Most bolts across", blank: "what the width fits" },
      { path: ["search", "min_across"], kind: "count", label: "Fewest bolts across", blank: "2 where the narrowest plate fits two, else 1" },
      { path: ["search", "max_splice_length"], kind: "quantity", quantity: "length", label: "Longest splice" },
      { path: ["search", "max_end_distance"], kind: "quantity", quantity: "length", label: "Largest end distance" },
      { path: ["search", "gauge"], kind: "quantity", quantity: "length", label: "Fixed gauge" },
      { path: ["search", "cover_thicknesses"], kind: "list", items: "number", label: "Cover plate thicknesses to try", when: butt },
    ],
  },
  {
    id: "options",
    title: "Conventions and options",
    folded: true,
    fields: [
      { path: ["options", "exposed_to_corrosion"], kind: "flag", blank: false, label: "Exposed to corrosion", hint: { "is800-2007": "cl. 10.2.4.3: edge distance at most 40 + 4t", "en1993-1-8": "Table 3.3 maxima apply", "aisc360-16": "J3.5 maxima for weathering steel" } },
      { path: ["options", "bolt_net_area"], kind: "choice", label: "Bolt area through the threads", choices: [{ value: "0.78-gross", text: "0.78 × π d²/4" }, { value: "iso-stress-area", text: "ISO 898-1 stress area As" }], blank: "the code's default" },
      { path: ["options", "bolt_strength"], kind: "choice", label: "Bolt fub", choices: [{ value: "minimum", text: "ISO 898-1 minimum" }, { value: "nominal", text: "nominal" }], blank: "the code's default" },
      { path: ["options", "net_section_load"], kind: "choice", label: "Load on each net-section path", choices: [{ value: "full", text: "the plate's whole force" }, { value: "transferred", text: "the load not yet transferred" }], blank: "the plate's whole force" },
      { path: ["options", "block_shear_load"], kind: "choice", label: "Load on a block", choices: [{ value: "share", text: "its bolts' share" }, { value: "full", text: "the plate's whole force" }], blank: "its bolts' share" },
      { path: ["options", "efficiency_basis"], kind: "choice", label: "Efficiency basis", choices: [{ value: "lesser", text: "the lesser of yield and rupture" }, { value: "rupture", text: "rupture" }, { value: "yield", text: "yield" }], blank: "the lesser of yield and rupture" },
      { path: ["options", "bearing_deformation"], kind: "choice", label: "Deformation at the bolt hole (J3.10)", choices: [{ value: "considered", text: "a design consideration" }, { value: "not-considered", text: "not a design consideration" }], blank: "the code's default", when: code("aisc360-16") },
      { path: ["options", "fillers_developed"], kind: "flag", blank: false, label: "Fillers developed (J5.2)", when: code("aisc360-16") },
      { path: ["options", "steel_strengths"], kind: "choice", label: "Steel strengths from", choices: [{ value: "en10025-2", text: "EN 10025-2" }, { value: "en1993-1-1", text: "EN 1993-1-1 Table 3.1" }], blank: "the code's default", when: code("en1993-1-8") },
      { path: ["options", "small_bolt_clearance"], kind: "choice", label: "Clearance of M12 and M14 holes", choices: [{ value: 1, text: "1 mm" }, { value: 2, text: "2 mm" }], blank: "the code's default", when: code("en1993-1-8") },
    ],
  },
  {
    id: "factors",
    title: "Partial factors (national annex)",
    folded: true,
    when: code("en1993-1-8"),
    fields: [
      { path: ["factors", "gamma_m0"], kind: "number", label: "γM0", blank: "1.00" },
      { path: ["factors", "gamma_m1"], kind: "number", label: "γM1", blank: "1.00" },
      { path: ["factors", "gamma_m2"], kind: "number", label: "γM2", blank: "1.25" },
      { path: ["factors", "gamma_m3"], kind: "number", label: "γM3", blank: "1.25" },
      { path: ["factors", "gamma_m3_ser"], kind: "number", label: "γM3,ser", blank: "1.10" },
    ],
  },
  {
    id: "costs",
    title: "Prices (over the cost catalogue)",
    folded: true,
    fields: [
      { path: ["costs", "currency"], kind: "text", label: "Currency" },
      { path: ["costs", "hole"], kind: "number", label: "Per hole, per plate drilled" },
      { path: ["costs", "plate_per_kg"], kind: "number", label: "Splice plate, per kg" },
      { path: ["costs", "friction_grip_extra"], kind: "number", label: "Extra per friction-grip bolt" },
      { path: ["costs", "bolt_assembly"], kind: "prices", label: "Bolt assembly, by size and class" },
    ],
  },
  {
    id: "compare",
    title: "Equivalent materials for a comparison of codes",
    folded: true,
    fields: [
      { path: ["compare", "steel"], kind: "equivalents", label: "Steel grades" },
      { path: ["compare", "bolts"], kind: "equivalents", label: "Bolt classes and grades" },
    ],
  },
];

export const FIELDS: readonly Field[] = SECTIONS.flatMap((s) => s.fields);

export const fieldKey = (path: readonly string[]): string => path.join(".");

/** The words for a code (the first code's where none is chosen yet). */
export function words(w: Words, codeId: CodeId | undefined): string {
  return typeof w === "string" ? w : w[codeId ?? "is800-2007"];
}

/** The field a message's path belongs to: the longest field path it starts with ("search.sizes[1]" → search.sizes). */
export function fieldOfPath(path: string): Field | undefined {
  const plain = path.replace(/\[\d+\]/g, "");
  let best: Field | undefined;
  for (const f of FIELDS) {
    const key = fieldKey(f.path);
    if ((plain === key || plain.startsWith(`${key}.`)) && (!best || key.length > fieldKey(best.path).length)) best = f;
  }
  return best;
}

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/** A typed number as a number, anything else as the text typed (the schema then names what is wrong). */
function scalar(text: string): string | number {
  const t = text.trim();
  return NUMBER.test(t) ? Number(t) : t;
}

/**
 * The file's value for what was typed into a field; undefined removes the field from the file (its
 * default applies). Text is kept as typed where the schema reads text ("16 mm", "3/4 in", "auto").
 */
export function valueOfInput(field: Field, input: string | boolean): unknown {
  if (field.kind === "flag") return input === true;
  const text = String(input);
  if (text.trim() === "") return undefined;
  switch (field.kind) {
    case "text":
      return fieldKey(field.path) === "packing" ? scalar(text) : text.trim();
    case "quantity":
    case "number":
    case "count":
      return scalar(text);
    case "choice": {
      const choice = field.choices.find((c) => String(c.value) === text);
      return choice ? choice.value : text;
    }
    case "list": {
      const items = text.split(/\s*[,;]\s*/).map((t) => t.trim()).filter(Boolean);
      return field.items === "number" ? items.map(scalar) : items.map((t) => (/^\d+(\.\d+)?$/.test(t) && !t.includes(".") ? Number(t) : t));
    }
    case "points":
      return text
        .split(/\n/)
        .map((line) => line.trim())
        .filter(Boolean)
        .map((line) => line.split(/\s*[,;]\s*|\s+(?=[-+\d.])/).filter(Boolean).map(scalar));
    default:
      return undefined;
  }
}

/** A field's text for the form, from the file's value. */
export function inputOfValue(field: Field, value: unknown): string | boolean {
  if (field.kind === "flag") return typeof value === "boolean" ? value : field.blank;
  if (value === undefined || value === null) return "";
  if (field.kind === "list" && Array.isArray(value)) return value.map(String).join(", ");
  if (field.kind === "points" && Array.isArray(value)) {
    return value.map((p) => (Array.isArray(p) ? p.map(String).join(", ") : p && typeof p === "object" ? `${String((p as Record<string, unknown>).x)}, ${String((p as Record<string, unknown>).y)}` : String(p))).join("\n");
  }
  return typeof value === "object" ? JSON.stringify(value) : String(value);
}

/** Whether a field applies, or holds a value (then it is shown so that it can be changed or cleared). */
export function fieldShown(field: Field, section: Section, c: FieldContext): boolean {
  if (at(c.file, field.path) !== undefined) return true;
  return (section.when?.(c) ?? true) && (field.when?.(c) ?? true);
}

/** Whether any field of a section holds a value. */
export function sectionHasValue(section: Section, file: Record<string, unknown>): boolean {
  return section.fields.some((f) => at(file, f.path) !== undefined);
}

/** The unit a bare number of a field is read in, for its label. */
export function unitOf(field: Field, file: Record<string, unknown>): string {
  const us = at(file, ["units"]) === "us";
  if (field.kind === "quantity") return field.quantity === "length" ? (us ? "in" : "mm") : us ? "kip" : "kN";
  if (field.kind === "list" && fieldKey(field.path) === "search.cover_thicknesses") return us ? "in" : "mm";
  if (field.kind === "points") return us ? "in" : "mm";
  if (fieldKey(field.path) === "packing") return us ? "in" : "mm";
  return "";
}
