/**
 * Bearing capacity of a bolt on a plate.
 */
import { PARTIAL_FACTORS } from "./factors.js";

/**
 * Bearing factor kb.
 * IS 800:2007, cl. 10.3.4.
 * kb = min(e/(3 d0), p/(3 d0) − 0.25, fub/fu, 1.0). Pass Infinity for e or p when the joint has no such bolt
 * (no inner bolt: no p term).
 */
export function kb(e_mm: number, p_mm: number, d0_mm: number, fub_MPa: number, fu_MPa: number): number {
  return Math.min(e_mm / (3 * d0_mm), p_mm / (3 * d0_mm) - 0.25, fub_MPa / fu_MPa, 1.0);
}

/**
 * Design bearing capacity of one bolt on one plate, Vdpb (N).
 * IS 800:2007, cl. 10.3.4.
 * Vnpb = 2.5 · kb · d · t · fu;  Vdpb = Vnpb / γmb, times the hole factor (0.7 oversize / short slot,
 * 0.5 long slot).
 */
export function Vdpb(kb_value: number, d_mm: number, t_mm: number, fu_MPa: number, holeFactor: number): number {
  return (2.5 * kb_value * d_mm * t_mm * fu_MPa * holeFactor) / PARTIAL_FACTORS.gamma_mb;
}
