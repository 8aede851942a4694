/**
 * A search result written back as a scenario that `check` accepts: the original file's fields with the
 * chosen bolts, layout and cover thickness. Pure: returns YAML text; the CLI writes it.
 */
import { stringify } from "yaml";
import type { Candidate } from "../search/search.js";
import { boltGradeText, boltSizeText, inchBoltSize, inchSizeText } from "../catalogue/bolts.js";
import { foundLayoutName } from "../text/layout-name.js";

export function savedScenarioText(original: Record<string, unknown>, c: Candidate, rank: number): string {
  const out: Record<string, unknown> = structuredClone(original);
  if (typeof out.name === "string") out.name = foundLayoutName(out.name);
  // A file in US units (`units: us`) reads bare numbers as inches: write lengths in inches there.
  const us = original.units === "us";
  const len = (mm: number) => (us ? Math.round((mm / 25.4) * 1e6) / 1e6 : mm);
  const l = c.layout;
  const b = c.scenario.bolts;
  const inch = inchBoltSize(b.size_mm);
  const bolts: Record<string, unknown> = { size: inch !== undefined ? inchSizeText(inch) : `M${b.size_mm}`, class: b.astmGrade ?? (inch !== undefined ? boltGradeText(b.propertyClass, b.size_mm) : b.propertyClass), type: b.assembly, threads_in_shear_planes: b.threadsInShearPlanes, hole: b.hole };
  if (b.preloaded) {
    if (c.scenario.code.startsWith("aisc")) bolts.joint = "pretensioned";
    else bolts.preloaded = true;
  }
  if (b.slipFactor !== undefined) bolts.slip_factor = b.slipFactor;
  if (b.slipAt !== undefined) bolts.slip_at = b.slipAt;
  if (b.slotDirection !== undefined) bolts.slot_direction = b.slotDirection;
  out.bolts = bolts;
  const butt = c.scenario.splice.type !== "lap";
  if (l.kind === "grid" || l.kind === "staggered") {
    out.layout = {
      pattern: l.kind,
      across: l.across,
      along: l.along,
      ...(l.along > 1 ? { pitch: len(l.pitch_mm) } : {}),
      ...(l.across > 1 || l.kind === "staggered" ? { gauge: len(l.gauge_mm) } : {}),
      end_distance: len(l.endDistance_mm),
      ...(butt ? { end_distance_at_butt: len(l.endDistanceAtButt_mm) } : {}),
    };
  } else if (l.kind === "tapered") {
    out.layout = { pattern: "tapered", across_per_line: l.acrossPerLine, pitch: len(l.pitch_mm), gauge: len(l.gauge_mm), end_distance: len(l.endDistance_mm), ...(butt ? { end_distance_at_butt: len(l.endDistanceAtButt_mm) } : {}) };
  }
  if (c.family.coverThickness_mm !== undefined) {
    const plates = (out.plates ?? {}) as Record<string, Record<string, unknown>>;
    for (const k of ["cover", "cover_b"]) if (plates[k]) plates[k] = { ...plates[k], thickness: len(c.family.coverThickness_mm) };
    out.plates = plates;
  }
  const header =
    `# Written by splicewright search: result ${rank} (${c.family.pattern}, ${boltSizeText(c.family.size_mm)} ${c.family.propertyClass}).\n` +
    `# Check it with: splicewright check <this file>. Results are to be verified by a qualified engineer.\n`;
  return header + stringify(out);
}
