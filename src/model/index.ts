export { meanAndSquares, mean, variance } from './moments.js';
export { RunningMoments } from './running-moments.js';
export { median, medianAbsoluteDeviation } from './median.js';
export { medianOfOthers } from './median-of-others.js';
export { fitGaussian, MAD_TO_SIGMA, MEAN_AD_TO_SIGMA, type GaussianFit, type FitMethod } from './fit.js';
export {
  gaussianDensity,
  gaussianLogDensity,
  plugInRelativeDensity,
  predictiveRelativeDensity,
  predictiveScale,
} from './density.js';
export {
  normalTail,
  studentTail,
  studentUpperQuantile,
  studentRelativeDensity,
  studentLogDensity,
  cutoffT,
  cutoffSigma,
  cutoffLevel,
  type Side,
} from './tails.js';
export { halfTailShape, DOF_GRID, type TailShape } from './tail-shape.js';
export { variancePrior, moderatedVariance, type VariancePrior } from './moderated-variance.js';
export { detectableShift } from './detectable.js';
export { toFitScale, fromFitScale, type Scale } from './transform.js';
export { adjustTails, holmLevels, type FamilyMethod } from './family.js';
export { detectChangePoints, differenceSigma, type ChangePointOptions } from './change-points.js';
