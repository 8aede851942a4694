/** The clause functions of IS 800:2007, for direct use and for tests. */
export { beta_lj, beta_lg, beta_pkg, Vdsb } from "./bolt-shear.js";
export { kb, Vdpb } from "./bearing.js";
export { F0, Vdsf } from "./slip.js";
export { Tdg, Tdn, Tdb } from "./tension-member.js";
export { standardHoleDiameter_mm, holeDimensions, holeFactorKh, bearingHoleFactor } from "./holes.js";
export { PARTIAL_FACTORS } from "./factors.js";
export { epsilon, plateStrength } from "./materials.js";
