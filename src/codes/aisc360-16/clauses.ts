/** The clause functions of AISC 360-16 (LRFD), for direct use and for tests. */
export { Fnv_MPa, longJointFactor, longJointLimit_mm, fillerFactor, a307GripFactor, phiRnShear } from "./bolt-shear.js";
export { bearingCoefficients, phiRnBearing, phiRnTearout, clearDistance_mm } from "./bearing.js";
export { SLIP_CLASSES, Du, phiSlip, hf, phiRnSlip } from "./slip.js";
export { phiPnYield, phiPnRupture, spliceEffectiveArea, phiRnBlockShear } from "./tension.js";
export { holeDimensions, holeJ33_in, holeJ33M_mm, netAllowance_mm } from "./holes.js";
export { minSpacing_mm, minEdge_mm, maxEdge_mm, maxSpacing_mm } from "./spacing.js";
export { plateStrength, Tb_N, boltGroupOf, astmGradeOf } from "./materials.js";
export { PHI } from "./factors.js";
