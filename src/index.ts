/** splicewright's public surface: the pure calculation core, re-exported flat. */
export * from "./units/units.js";
export * from "./catalogue/bolts.js";
export * from "./catalogue/steels.js";
export type * from "./model/scenario.js";
export type * from "./model/joint.js";
export type * from "./model/results.js";
export { buildJoint, holesOfPlate } from "./geometry/joint-builder.js";
export { leastNetPath, describePath } from "./geometry/net-section.js";
export { blockShapes } from "./geometry/block-shear.js";
export { patternHoles, describePattern } from "./geometry/patterns.js";
export { findCode, codeIds } from "./codes/registry.js";
export { IS800_2007 } from "./codes/is800-2007/index.js";
export * as is800 from "./codes/is800-2007/clauses.js";
export { checkScenario, checkJoint, exitCodeOf } from "./engine/check.js";
