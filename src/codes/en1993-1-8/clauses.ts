/** The clause functions of EN 1993-1-8 (with EN 1993-1-1), for direct use and for tests. */
export { alpha_v, Fv_Rd, beta_Lf, beta_p, smallBoltHoleFactor } from "./bolt-shear.js";
export { alpha_d_end, alpha_d_inner, alpha_b, k1_edge, k1_inner, Fb_Rd, singleLapLimit, groupResistance } from "./bearing.js";
export { Fp_C, Fs_Rd } from "./slip.js";
export { Npl_Rd, Nu_Rd, Nnet_Rd, Veff_1_Rd } from "./members.js";
export { holeDimensions, normalClearance_mm, oversizeClearance_mm, shortSlotClearance_mm, bearingHoleFactor, ks } from "./holes.js";
export { RECOMMENDED_FACTORS, settingsOf, categoryOf } from "./settings.js";
export { plateStrength, boltStrength } from "./materials.js";
