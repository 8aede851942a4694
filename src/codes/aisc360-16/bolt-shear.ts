/**
 * Bolt shear of bearing-type connections, AISC 360-16 J3.6 with Table J3.2 and the filler rule of J5.2.
 */
import { inchBoltSize } from "../../catalogue/bolts.js";
import { MM_PER_IN, MPA_PER_KSI, PHI } from "./factors.js";
import type { BoltGroup } from "./materials.js";

/**
 * Nominal shear stress Fnv, MPa. AISC 360-16 Table J3.2:
 * A307 27 ksi (188 MPa); Group A threads included (N) 54 ksi (372 MPa), excluded (X) 68 ksi (469 MPa);
 * Group B N 68 ksi (469 MPa), X 84 ksi (579 MPa). Inch bolts take the ksi values (exact conversion),
 * metric bolts the MPa values of the metric column. A307 bolts are taken threads included.
 */
export function Fnv_MPa(group: BoltGroup, threadsIncluded: boolean, inch: boolean): number {
  const ksi = { A307: [27, 27], "Group A": [54, 68], "Group B": [68, 84] } as const satisfies Record<BoltGroup, readonly [number, number]>;
  const mpa = { A307: [188, 188], "Group A": [372, 469], "Group B": [469, 579] } as const satisfies Record<BoltGroup, readonly [number, number]>;
  const i = threadsIncluded ? 0 : 1;
  return inch ? ksi[group][i] * MPA_PER_KSI : mpa[group][i];
}

/** Fastener pattern length beyond which Fnv is reduced, 38 in (950 mm). AISC 360-16 Table J3.2, note [b]. */
export function longJointLimit_mm(inch: boolean): number {
  return inch ? 38 * MM_PER_IN : 950;
}

/**
 * Long-joint factor on Fnv: 0.833 (83.3 % of the tabulated values) for end-loaded connections whose
 * fastener pattern length exceeds 38 in (950 mm); else 1.
 * AISC 360-16 Table J3.2, note [b].
 * @param length_mm distance along the force between the first and last bolt centre lines of the group
 */
export function longJointFactor(length_mm: number, inch: boolean): number {
  return length_mm > longJointLimit_mm(inch) + 1e-9 ? 0.833 : 1.0;
}

/**
 * Filler factor on bolt shear: 1 for fillers up to ¼ in (6.35 mm); 1 − 0.4(t − 0.25), t in inches, for
 * fillers over ¼ in up to ¾ in (19.05 mm) not developed; 1 when the fillers are developed.
 * AISC 360-16 J5.2(b). Fillers over ¾ in must be developed (checked as a rule, see spacing.ts).
 */
export function fillerFactor(t_mm: number, developed: boolean): number {
  const t_in = t_mm / MM_PER_IN;
  if (developed || t_in <= 0.25 + 1e-9) return 1.0;
  return 1 - 0.4 * (Math.min(t_in, 0.75) - 0.25);
}

/** The grip step of Table J3.2's A307 note: 1/16 in for an inch bolt, 2 mm for a metric one, mm. */
export function a307GripStep_mm(d_mm: number): number {
  return inchBoltSize(d_mm) !== undefined ? MM_PER_IN / 16 : 2;
}

/**
 * A307 long-grip factor: the tabulated shear reduced by 1 % for each 1/16 in (2 mm for a metric bolt) of
 * grip over five diameters. AISC 360-16 Table J3.2, note [c] (from memory; the same wording, "1/16 in.
 * (2 mm)", is printed in 360-10 note [c] and 360-22 note [d]). Other groups: 1.
 */
export function a307GripFactor(group: BoltGroup, grip_mm: number, d_mm: number): number {
  if (group !== "A307" || grip_mm <= 5 * d_mm + 1e-9) return 1.0;
  return Math.max(0, 1 - 0.01 * ((grip_mm - 5 * d_mm) / a307GripStep_mm(d_mm)));
}

/**
 * Design shear strength of one bolt in one shear plane, φRn = φ·Fnv·Ab (N), with the reductions.
 * AISC 360-16 J3.6, Eq. J3-1; φ = 0.75; Ab = π d²/4, the nominal unthreaded body area.
 */
export function phiRnShear(Fnv: number, Ab_mm2: number, reduction = 1): number {
  return PHI.boltShear * Fnv * Ab_mm2 * reduction;
}
