export { wilson, type ProportionInterval, type WilsonOptions } from "./wilson";
export { newcombeDifference, type DifferenceInterval } from "./newcombe";
export { cochranArmitage, type TrendGroup, type TrendResult, type TrendDirection } from "./trend";
export { cohenKappa, precisionRecall, type KappaResult, type Confusion, type PrecisionRecall } from "./agreement";
export { normalQuantile, normalCdf, chiSquareCdf, twoSidedNormalP, zForConfidence } from "./distributions";
