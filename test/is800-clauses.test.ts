/**
 * IS 800:2007 clause functions against values published outside the project.
 * Each value names its source; "F" values are worked here from the clause's formula.
 */
import { describe, expect, it } from "vitest";
import { boltMaterial, boltNetArea_mm2, shankArea_mm2 } from "../src/catalogue/bolts.js";
import { is2062Strength } from "../src/catalogue/steels.js";
import * as is800 from "../src/codes/is800-2007/clauses.js";

const kN = (n: number) => n / 1000;

/** Vdsb of one bolt, all planes through threads, short joint, no packing. */
function shearThreads(d: number, fub: number, planes = 1): number {
  return is800.Vdsb({ fub_MPa: fub, nn: planes, ns: 0, Anb_mm2: boltNetArea_mm2(d, "0.78-gross"), Asb_mm2: shankArea_mm2(d), beta_lj: 1, beta_lg: 1, beta_pkg: 1 });
}

describe("IS 800:2007 cl. 10.3.3 bolt shear, Vdsb", () => {
  // Source: Indian design-aid table "Permissible strength of structural bolts as per IS 800:2007"
  // (net area 0.78 × gross, γmb 1.25; 4.6 fub 400, 8.8 fub 830 for d > 16), tabulated to 0.01 kN;
  // M20 4.6 = 45.27 kN also in ../shared check values (IS 800:2007 cl. 10.3.3).
  it.each([
    [12, 400, 1, 16.3],
    [16, 400, 1, 28.98],
    [20, 400, 1, 45.27],
    [20, 400, 2, 90.55],
    [36, 400, 1, 146.69],
    [20, 830, 1, 93.94],
    [20, 830, 2, 187.89],
  ])("M%i, fub %i MPa, %i plane(s) through threads → %f kN", (d, fub, planes, expected) => {
    expect(kN(shearThreads(d, fub, planes))).toBeCloseTo(expected, 1);
    expect(Math.abs(kN(shearThreads(d, fub, planes)) - expected)).toBeLessThan(0.011);
  });

  it("M20 class 8.8 with nominal fub 800 MPa gives 90.54 kN (check values, cl. 10.3.3, F)", () => {
    expect(kN(shearThreads(20, 800))).toBeCloseTo(90.54, 2);
  });

  it("the shank area counts where no thread is in the plane: fub/√3 · π d²/4 / γmb (F)", () => {
    const v = is800.Vdsb({ fub_MPa: 400, nn: 0, ns: 1, Anb_mm2: 245, Asb_mm2: shankArea_mm2(20), beta_lj: 1, beta_lg: 1, beta_pkg: 1 });
    // 400/√3 × 314.16 / 1.25 = 58.04 kN
    expect(kN(v)).toBeCloseTo(58.04, 2);
  });
});

describe("IS 800:2007 reduction factors", () => {
  it("βlj = 1.075 − lj/200d: 0.975 at lj = 20d (check values, cl. 10.3.3.1, F)", () => {
    expect(is800.beta_lj(20 * 20, 20)).toBeCloseTo(0.975, 6);
  });
  it("βlj is 1.0 up to 15d and floors at 0.75 (cl. 10.3.3.1)", () => {
    expect(is800.beta_lj(15 * 20, 20)).toBe(1);
    expect(is800.beta_lj(100 * 20, 20)).toBe(0.75);
    // 1.075 − 0.005 × 65 = 0.75 exactly at lj = 65d
    expect(is800.beta_lj(65 * 16, 16)).toBeCloseTo(0.75, 9);
  });
  it("βlg = 8/(3 + lg/d) = 0.889 at lg = 6d (check values, cl. 10.3.3.2, F); 1.0 up to 5d; never above βlj", () => {
    expect(is800.beta_lg(6 * 20, 20, 1)).toBeCloseTo(0.889, 3);
    expect(is800.beta_lg(5 * 20, 20, 1)).toBe(1);
    expect(is800.beta_lg(6 * 20, 20, 0.8)).toBe(0.8);
  });
  it("βpkg = 1 − 0.0125 tpk only above 6 mm (cl. 10.3.3.3): 8 mm → 0.9", () => {
    expect(is800.beta_pkg(6)).toBe(1);
    expect(is800.beta_pkg(8)).toBeCloseTo(0.9, 9);
  });
});

describe("IS 800:2007 cl. 10.3.4 bearing, Vdpb", () => {
  // Source: the same Indian design-aid table, "bearing strengths for M.S. plates" (fu 410 MPa),
  // which corresponds to kb = 0.5: M16 on 10 mm → 65.60 kN, M20 on 8 mm → 65.60 kN, M20 on 20 mm → 164.00 kN.
  it.each([
    [16, 10, 65.6],
    [20, 8, 65.6],
    [20, 20, 164.0],
    [12, 8, 39.36],
  ])("M%i on a %i mm plate, kb 0.5, fu 410 → %f kN", (d, t, expected) => {
    expect(kN(is800.Vdpb(0.5, d, t, 410, 1))).toBeCloseTo(expected, 2);
  });
  it("kb = min(e/3d0, p/3d0 − 0.25, fub/fu, 1.0) (cl. 10.3.4, F)", () => {
    expect(is800.kb(40, 65, 22, 830, 410)).toBeCloseTo(40 / 66, 9);
    expect(is800.kb(100, 50, 22, 830, 410)).toBeCloseTo(50 / 66 - 0.25, 9);
    expect(is800.kb(100, 200, 18, 400, 410)).toBeCloseTo(400 / 410, 9);
    expect(is800.kb(200, 300, 18, 830, 410)).toBe(1);
  });
  it("oversize and short slots reduce bearing by 0.7, long slots by 0.5 (cl. 10.3.4, from memory)", () => {
    expect(is800.bearingHoleFactor("standard")).toBe(1);
    expect(is800.bearingHoleFactor("oversize")).toBe(0.7);
    expect(is800.bearingHoleFactor("short-slot")).toBe(0.7);
    expect(is800.bearingHoleFactor("long-slot")).toBe(0.5);
  });
});

describe("IS 800:2007 cl. 10.4.3 slip resistance, Vdsf", () => {
  it("M20 8.8, μf 0.20, ne 1, Kh 1, fub 830, γmf 1.25 → 22.78 kN (check values; Indian design-aid table)", () => {
    const F0 = is800.F0(boltNetArea_mm2(20, "0.78-gross"), 830);
    expect(kN(is800.Vdsf(0.2, 1, 1, F0, "ultimate", 1))).toBeCloseTo(22.78, 2);
  });
  it("γmf is 1.10 at service and 1.25 at ultimate (Table 5)", () => {
    expect(is800.PARTIAL_FACTORS.gamma_mf_service).toBe(1.1);
    expect(is800.PARTIAL_FACTORS.gamma_mf_ultimate).toBe(1.25);
    expect(is800.Vdsf(0.5, 1, 1, 1000, "service", 1) / is800.Vdsf(0.5, 1, 1, 1000, "ultimate", 1)).toBeCloseTo(1.25 / 1.1, 9);
  });
  it("Kh: 1.0 clearance, 0.85 oversize / short slot / long slot across, 0.7 long slot along (cl. 10.4.3)", () => {
    expect(is800.holeFactorKh("standard", undefined)).toBe(1);
    expect(is800.holeFactorKh("oversize", undefined)).toBe(0.85);
    expect(is800.holeFactorKh("short-slot", "along")).toBe(0.85);
    expect(is800.holeFactorKh("long-slot", "across")).toBe(0.85);
    expect(is800.holeFactorKh("long-slot", "along")).toBe(0.7);
  });
});

describe("IS 800:2007 cl. 6.2 and 6.3.1, plates in tension", () => {
  it("200 × 12 E250 plate with two 22 mm holes: Tdg 545.5 kN, Tdn 552.6 kN (check values, F)", () => {
    expect(kN(is800.Tdg(200 * 12, 250))).toBeCloseTo(545.5, 1);
    expect(kN(is800.Tdn((200 - 2 * 22) * 12, 410))).toBeCloseTo(552.6, 1);
  });
  it("block shear Tdb = min(Tdb1, Tdb2) worked from cl. 6.4.1 (hand calculation)", () => {
    // Avg 3360, Avn 2304, Atg 2240, Atn 1536 mm², fy 250, fu 410:
    // Tdb1 = 3360×250/(√3×1.10) + 0.9×1536×410/1.25 = 440 886 + 453 427 = 894 313 N
    // Tdb2 = 0.9×2304×410/(√3×1.25) + 2240×250/1.10 = 392 679 + 509 091 = 901 770 N
    const r = is800.Tdb(3360, 2304, 2240, 1536, 250, 410);
    expect(r.Tdb1_N).toBeCloseTo(894_313, -1);
    expect(r.Tdb2_N).toBeCloseTo(901_770, -1);
    expect(r.Tdb_N).toBe(r.Tdb1_N);
  });
  it("partial safety factors of Table 5: γm0 1.10, γm1 1.25, γmb 1.25 (check values)", () => {
    expect(is800.PARTIAL_FACTORS.gamma_m0).toBe(1.1);
    expect(is800.PARTIAL_FACTORS.gamma_m1).toBe(1.25);
    expect(is800.PARTIAL_FACTORS.gamma_mb).toBe(1.25);
  });
});

describe("materials and holes", () => {
  it("IS 2062 E250: fu 410; fy 250 (t < 20), 240 (20–40), 230 (> 40) MPa (check values, IS 2062)", () => {
    expect(is2062Strength("E250", 19.9)).toMatchObject({ fy_MPa: 250, fu_MPa: 410 });
    expect(is2062Strength("E250", 20).fy_MPa).toBe(240);
    expect(is2062Strength("E250", 40).fy_MPa).toBe(240);
    expect(is2062Strength("E250", 41).fy_MPa).toBe(230);
  });
  it("IS 2062 E350: fu 490; fy 350 / 330 / 320 MPa (IS 2062 Table 2, from memory)", () => {
    expect(is2062Strength("E350", 16)).toMatchObject({ fy_MPa: 350, fu_MPa: 490 });
    expect(is2062Strength("E350", 25).fy_MPa).toBe(330);
    expect(is2062Strength("E350", 50).fy_MPa).toBe(320);
  });
  it.each([
    ["E275", 430, 275, 265, 255],
    ["E300", 440, 300, 290, 280],
    ["E410", 540, 410, 390, 380],
    ["E450", 570, 450, 430, 420],
  ] as const)("IS 2062 %s: fu %i; fy %i / %i / %i MPa for t < 20, 20–40, > 40 mm (IS 2062:2011 Table 2, from memory; E450: E450A)", (grade, fu, fy1, fy2, fy3) => {
    expect(is2062Strength(grade, 12)).toMatchObject({ fy_MPa: fy1, fu_MPa: fu });
    expect(is2062Strength(grade, 20).fy_MPa).toBe(fy2);
    expect(is2062Strength(grade, 40).fy_MPa).toBe(fy2);
    expect(is2062Strength(grade, 45)).toMatchObject({ fy_MPa: fy3, fu_MPa: fu });
  });
  it("standard clearance holes: +1 mm M12–M14, +2 mm M16–M24, +3 mm M27 up (IS 800:2007 Table 19; check values)", () => {
    expect([12, 16, 20, 22, 24, 27, 30, 36].map(is800.standardHoleDiameter_mm)).toEqual([13, 18, 22, 24, 26, 30, 33, 39]);
  });
  it("oversize holes ≤ min(1.25d, d + 8); slots 1.33d and 2.5d long (IS 800:2007 cl. 17.2.4.3)", () => {
    expect(is800.holeDimensions(20, "oversize", undefined)).toEqual({ across_mm: 25, along_mm: 25 });
    expect(is800.holeDimensions(36, "oversize", undefined)).toEqual({ across_mm: 44, along_mm: 44 });
    expect(is800.holeDimensions(20, "short-slot", "along")).toEqual({ across_mm: 22, along_mm: 26.6 });
    expect(is800.holeDimensions(20, "long-slot", "across")).toEqual({ across_mm: 50, along_mm: 22 });
  });
  it("ISO 898-1 property classes: 8.8 fub 800 nominal, 830 minimum above M16; 4.6 400 (check values)", () => {
    expect(boltMaterial("8.8", 20, "minimum").fub_MPa).toBe(830);
    expect(boltMaterial("8.8", 16, "minimum").fub_MPa).toBe(800);
    expect(boltMaterial("8.8", 20, "nominal").fub_MPa).toBe(800);
    expect(boltMaterial("4.6", 20, "minimum").fub_MPa).toBe(400);
    expect(boltMaterial("10.9", 20, "nominal").fub_MPa).toBe(1000);
  });
  it("Anb: 0.78 × gross equals the ISO stress area for M20 (245 mm²) but not M12 (88.2 vs 84.3) (check values pitfall)", () => {
    expect(boltNetArea_mm2(20, "0.78-gross")).toBeCloseTo(245.0, 0);
    expect(boltNetArea_mm2(20, "iso-stress-area")).toBe(245);
    expect(boltNetArea_mm2(12, "0.78-gross")).toBeCloseTo(88.2, 1);
    expect(boltNetArea_mm2(12, "iso-stress-area")).toBe(84.3);
  });
  it("ε = √(250/fy) (IS 800:2007 Table 2)", () => {
    expect(is800.epsilon(250)).toBe(1);
    expect(is800.epsilon(350)).toBeCloseTo(0.845, 3);
  });
});
