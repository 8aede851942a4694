/**
 * AISC 360-16 (LRFD) clause functions against values published outside the project: AISC Manual
 * Tables 7-1, 7-4, 7-5 and Specification Tables J3.1–J3.4 (see ../shared check values). Each value names
 * its source and whether it was read (T), recalled (from memory) or worked here from the formula (F).
 */
import { describe, expect, it } from "vitest";
import { astmBoltGrade, inchSizeText, shankArea_mm2 } from "../src/catalogue/bolts.js";
import { bearingCoefficients, clearDistance_mm, phiRnBearing, phiRnTearout } from "../src/codes/aisc360-16/bearing.js";
import { a307GripFactor, fillerFactor, Fnv_MPa, longJointFactor, phiRnShear } from "../src/codes/aisc360-16/bolt-shear.js";
import { holeDimensions, netAllowance_mm } from "../src/codes/aisc360-16/holes.js";
import { plateStrength, Tb_N } from "../src/codes/aisc360-16/materials.js";
import { hf, phiRnSlip, phiSlip, SLIP_CLASSES } from "../src/codes/aisc360-16/slip.js";
import { maxEdge_mm, maxSpacing_mm, minEdge_mm, minSpacing_mm } from "../src/codes/aisc360-16/spacing.js";
import { phiPnRupture, phiPnYield, phiRnBlockShear, spliceEffectiveArea } from "../src/codes/aisc360-16/tension.js";

const IN = 25.4;
const KIP = 4448.2216152605;
const KSI = 6.894757293168;
const kips = (N: number) => N / KIP;
const Ab = (d_in: number) => shankArea_mm2(d_in * IN);

describe("J3.6 bolt shear φRn = 0.75·Fnv·Ab (Table J3.2), one shear plane", () => {
  // AISC Manual Table 7-1 (available shear strength of bolts, kips), LRFD column, single shear.
  it("3/4 in Group A, threads included (A325-N): 17.9 kips — Manual Table 7-1 (T, ../shared check values)", () => {
    expect(kips(phiRnShear(Fnv_MPa("Group A", true, true), Ab(0.75)))).toBeCloseTo(17.9, 1);
  });
  it.each([
    // [group, threads included, d in, kips, source]
    ["Group A", false, 0.75, 22.5, "Table 7-1, A-X (from memory; F: 0.75 × 68 × 0.4418)"],
    ["Group B", true, 0.75, 22.5, "Table 7-1, B-N (from memory; F)"],
    ["Group B", false, 0.75, 27.8, "Table 7-1, B-X (from memory; F: 0.75 × 84 × 0.4418)"],
    ["Group A", true, 0.875, 24.35, "Table 7-1, ⅞ in A-N: 24.3 in ../shared check values (from memory), F: 0.75 × 54 × 0.6013 = 24.35"],
    ["Group A", true, 1, 31.8, "Table 7-1, 1 in A-N (from memory)"],
    ["Group A", true, 0.5, 7.95, "Table 7-1, ½ in A-N (from memory)"],
    ["A307", true, 0.75, 8.95, "Table 7-1, ¾ in A307 (from memory; F: 0.75 × 27 × 0.4418)"],
  ] as const)("%s, threads included %s, %f in → %f kips (%s)", (group, threads, d, expected) => {
    expect(kips(phiRnShear(Fnv_MPa(group, threads, true), Ab(d)))).toBeCloseTo(expected, 1);
  });
  it("Table J3.2M metric column: Group A-N 372 MPa, M20 → 0.75 × 372 × 314.16 = 87.65 kN (from memory; F)", () => {
    expect(Fnv_MPa("Group A", true, false)).toBe(372);
    expect(phiRnShear(Fnv_MPa("Group A", true, false), shankArea_mm2(20)) / 1000).toBeCloseTo(87.65, 2);
  });
  it("Table J3.2 ksi values: A307 27, Group A 54 / 68, Group B 68 / 84 ksi (from memory)", () => {
    expect(Fnv_MPa("A307", true, true) / KSI).toBeCloseTo(27, 9);
    expect(Fnv_MPa("Group A", false, true) / KSI).toBeCloseTo(68, 9);
    expect(Fnv_MPa("Group B", false, true) / KSI).toBeCloseTo(84, 9);
  });
  it("Table J3.2 note [b]: Fnv × 0.833 beyond a 38 in (950 mm) fastener pattern, none at or below it", () => {
    expect(longJointFactor(38 * IN, true)).toBe(1);
    expect(longJointFactor(38.5 * IN, true)).toBe(0.833);
    expect(longJointFactor(950, false)).toBe(1);
    expect(longJointFactor(951, false)).toBe(0.833);
  });
  it("J5.2(b) fillers: none up to 1/4 in; 1 − 0.4(t − 0.25) above — 1/2 in → 0.90, 3/4 in → 0.80 (F); developed → 1", () => {
    expect(fillerFactor(0.25 * IN, false)).toBe(1);
    expect(fillerFactor(0.5 * IN, false)).toBeCloseTo(0.9, 12);
    expect(fillerFactor(0.75 * IN, false)).toBeCloseTo(0.8, 12);
    expect(fillerFactor(0.5 * IN, true)).toBe(1);
  });
  it("Table J3.2 note [c] (from memory): A307 grip over 5d, −1 % per 1/16 in: 3/4 in bolt, grip 4.5 in → 0.88 (F)", () => {
    expect(a307GripFactor("A307", 4.5 * IN, 0.75 * IN)).toBeCloseTo(0.88, 9);
    expect(a307GripFactor("Group A", 4.5 * IN, 0.75 * IN)).toBe(1);
    expect(a307GripFactor("A307", 3.75 * IN, 0.75 * IN)).toBe(1);
  });
  it("Table J3.2 note [c], metric: −1 % per 2 mm, the note's metric step (\"1/16 in. (2 mm)\", 360-10 and 360-22 print the same): M20, grip 130 mm → 1 − 0.01 × (130 − 100)/2 = 0.85 (F)", () => {
    expect(a307GripFactor("A307", 130, 20)).toBeCloseTo(0.85, 12);
    expect(a307GripFactor("A307", 100, 20)).toBe(1);
  });
});

describe("J3.10 bearing and tearout per inch of plate thickness", () => {
  const one = IN; // 1 in thick
  it("bearing φ·2.4·d·t·Fu, 3/4 in bolt: Fu 58 → 78.3, Fu 65 → 87.8 kips/in — Manual Table 7-4 (from memory; F)", () => {
    const { cb } = bearingCoefficients(true, "standard", undefined);
    expect(kips(phiRnBearing(cb, 0.75 * IN, one, 58 * KSI))).toBeCloseTo(78.3, 1);
    // 0.75 × 2.4 × 0.75 × 65 = 87.75, printed 87.8 in the table.
    expect(Math.abs(kips(phiRnBearing(cb, 0.75 * IN, one, 65 * KSI)) - 87.8)).toBeLessThanOrEqual(0.05 + 1e-9);
  });
  it("tearout φ·1.2·lc·t·Fu, 3/4 in bolt, edge distance 1¼ in, Fu 58 → 44.0 kips/in — Manual Table 7-5 (from memory; F)", () => {
    const h = holeDimensions(0.75 * IN, "standard", undefined).along_mm;
    const lc = clearDistance_mm(1.25 * IN, null, h);
    expect(lc / IN).toBeCloseTo(1.25 - 13 / 32, 9);
    const { ct } = bearingCoefficients(true, "standard", undefined);
    expect(kips(phiRnTearout(ct, lc, one, 58 * KSI))).toBeCloseTo(44.0, 1);
  });
  it("deformation not a consideration: 3.0 and 1.5 (Eq. J3-6b, J3-6d); long slots across: 2.0 and 1.0 (J3-6e, J3-6f)", () => {
    expect(bearingCoefficients(false, "standard", undefined)).toMatchObject({ cb: 3.0, ct: 1.5 });
    expect(bearingCoefficients(true, "long-slot", "across")).toMatchObject({ cb: 2.0, ct: 1.0 });
  });
  it("clear distance to the hole ahead: spacing less one hole (3 in pitch, 13/16 in holes → 2.1875 in)", () => {
    expect(clearDistance_mm(10 * IN, 3 * IN, (13 / 16) * IN) / IN).toBeCloseTo(2.1875, 9);
  });
});

describe("J3.8 slip-critical connections", () => {
  it("Table J3.1 pretension Tb, Group A: 1/2 12, 5/8 19, 3/4 28, 7/8 39, 1 51, 1-1/8 64 kips; Group B 3/4 35 kips (¾ A from ../shared check values T; others from memory)", () => {
    const a: Array<[number, number]> = [[0.5, 12], [0.625, 19], [0.75, 28], [0.875, 39], [1, 51], [1.125, 64]];
    for (const [d, t] of a) expect(kips(Tb_N(d * IN, "Group A", d)!)).toBeCloseTo(t, 9);
    expect(kips(Tb_N(0.75 * IN, "Group B", 0.75)!)).toBeCloseTo(35, 9);
    expect(Tb_N(20, "Group A", undefined)! / 1000).toBe(142); // Table J3.1M, M20 Group A 142 kN (from memory)
  });
  it("3/4 in Group A, standard holes, one slip plane: Class A 9.49, Class B 15.8 kips (../shared check values, F)", () => {
    const Tb = Tb_N(0.75 * IN, "Group A", 0.75)!;
    expect(kips(phiRnSlip(phiSlip("standard", undefined), SLIP_CLASSES.A, hf(0), Tb, 1))).toBeCloseTo(9.49, 2);
    expect(kips(phiRnSlip(phiSlip("standard", undefined), SLIP_CLASSES.B, hf(1), Tb, 1))).toBeCloseTo(15.8, 1);
  });
  it("φ by hole type 1.00 / 0.85 / 0.70 and hf 1.0 (≤ 1 filler) / 0.85 (≥ 2 fillers), J3.8", () => {
    expect([phiSlip("standard", undefined), phiSlip("oversize", undefined), phiSlip("short-slot", "across"), phiSlip("short-slot", "along"), phiSlip("long-slot", "across")]).toEqual([1, 0.85, 1, 0.85, 0.7]);
    expect([hf(0), hf(1), hf(2)]).toEqual([1, 1, 0.85]);
  });
});

describe("Holes, spacing and edge distances", () => {
  it("Table J3.3 standard holes: 3/4 → 13/16 in, 7/8 → 15/16 in, 1 → 1-1/8 in (from memory; common practice d + 1/16, d ≥ 1: d + 1/8)", () => {
    expect(holeDimensions(0.75 * IN, "standard", undefined).across_mm / IN).toBeCloseTo(13 / 16, 9);
    expect(holeDimensions(0.875 * IN, "standard", undefined).across_mm / IN).toBeCloseTo(15 / 16, 9);
    expect(holeDimensions(1 * IN, "standard", undefined).across_mm / IN).toBeCloseTo(1.125, 9);
  });
  it.each([[16, 18], [20, 22], [22, 24], [24, 27], [27, 30], [30, 33], [36, 39]])("Table J3.3M standard hole M%i → %i mm (../shared check values, T)", (d, h) => {
    expect(holeDimensions(d, "standard", undefined).across_mm).toBe(h);
  });
  it("Table J3.3 3/4 in oversize 15/16 in, short slot 13/16 × 1 in, long slot 13/16 × 1-7/8 in (from memory)", () => {
    expect(holeDimensions(0.75 * IN, "oversize", undefined).across_mm / IN).toBeCloseTo(15 / 16, 9);
    expect(holeDimensions(0.75 * IN, "short-slot", "along")).toEqual({ across_mm: (13 / 16) * IN, along_mm: 1 * IN });
    expect(holeDimensions(0.75 * IN, "long-slot", "across")).toEqual({ across_mm: 1.875 * IN, along_mm: (13 / 16) * IN });
  });
  it("B4.3b: net-area hole width + 1/16 in (2 mm metric)", () => {
    expect(netAllowance_mm(0.75 * IN)).toBeCloseTo(IN / 16, 12);
    expect(netAllowance_mm(20)).toBe(2);
  });
  it.each([[0.5, 0.75], [0.625, 0.875], [0.75, 1], [0.875, 1.125], [1, 1.25], [1.125, 1.5]])("Table J3.4 min edge, %f in bolt → %f in (../shared check values, T)", (d, e) => {
    expect(minEdge_mm(d * IN) / IN).toBeCloseTo(e, 9);
  });
  it.each([[16, 22], [20, 26], [22, 28], [24, 30], [27, 34], [30, 38], [36, 46]])("Table J3.4M min edge M%i → %i mm (../shared check values, T)", (d, e) => {
    expect(minEdge_mm(d)).toBe(e);
  });
  it("J3.3 min spacing 2⅔ d (3/4 in → 2 in); J3.5 max 24 t ≤ 12 in, 14 t ≤ 7 in weathering, edge 12 t ≤ 6 in (from memory)", () => {
    expect(minSpacing_mm(0.75 * IN) / IN).toBeCloseTo(2, 12);
    expect(maxSpacing_mm(0.375 * IN, true, false) / IN).toBeCloseTo(9, 12);
    expect(maxSpacing_mm(1 * IN, true, false) / IN).toBeCloseTo(12, 12);
    expect(maxSpacing_mm(0.375 * IN, true, true) / IN).toBeCloseTo(5.25, 12);
    expect(maxEdge_mm(0.375 * IN, true) / IN).toBeCloseTo(4.5, 12);
    expect(maxEdge_mm(1 * IN, true) / IN).toBeCloseTo(6, 12);
    expect(maxEdge_mm(20, false)).toBe(150);
  });
});

describe("Plates: D2, J4.1, J4.3 and the materials", () => {
  it("A36 Fy 36 / Fu 58 ksi, A572 Gr 50 Fy 50 / Fu 65 ksi (AISC Manual Table 2-5; common practice)", () => {
    const a36 = plateStrength({ width_mm: 200, thickness_mm: 10, grade: "A36", edges: "rolled" });
    const a572 = plateStrength({ width_mm: 200, thickness_mm: 10, grade: "A572 Gr 50", edges: "rolled" });
    expect([a36.fy_MPa / KSI, a36.fu_MPa / KSI, a572.fy_MPa / KSI, a572.fu_MPa / KSI].map((v) => Math.round(v * 1e9) / 1e9)).toEqual([36, 58, 50, 65]);
  });
  it("8 × 1/2 in A572-50: φPn yield 0.90 × 50 × 4 = 180 kips; rupture with An 3.125 in² 0.75 × 65 × 3.125 = 152.3 kips (F)", () => {
    expect(kips(phiPnYield(4 * IN * IN, 50 * KSI))).toBeCloseTo(180, 9);
    expect(kips(phiPnRupture(3.125 * IN * IN, 65 * KSI))).toBeCloseTo(152.34, 2);
  });
  it("J4.1(b): An of a bolted splice plate not above 0.85 Ag", () => {
    expect(spliceEffectiveArea(2.8, 3)).toBeCloseTo(2.55, 12);
    expect(spliceEffectiveArea(2.3, 3)).toBe(2.3);
  });
  it("J4.3: φRn = 0.75 min(0.6 Fu Anv + Fu Ant, 0.6 Fy Agv + Fu Ant); A36, Agv 4.5, Anv 3.1875, Ant 1.5625 in² → yield branch 0.75(97.2 + 90.625) = 140.87 kips (F)", () => {
    const r = phiRnBlockShear(4.5, 3.1875, 1.5625, 36, 58);
    expect(r.yield_N).toBeCloseTo(0.75 * (0.6 * 36 * 4.5 + 58 * 1.5625), 9);
    expect(r.phiRn_N).toBeCloseTo(140.868750, 5);
    expect(r.rupture_N).toBeGreaterThan(r.yield_N);
  });
});

describe("catalogue: inch sizes and ASTM grades", () => {
  it("writes inch sizes as the trade does and reads ASTM grade names", () => {
    expect([0.5, 0.75, 1, 1.125].map(inchSizeText)).toEqual(["1/2 in", "3/4 in", "1 in", "1-1/8 in"]);
    expect(["A325", "F3125 A325", "ASTM F3125 Grade A490", "a307", "A325M", "8.8"].map(astmBoltGrade)).toEqual(["A325", "A325", "A490", "A307", "A325", undefined]);
  });
});
