export { InputError } from '../errors/input-error.js';
export { meanAndSquares, mean, variance } from './moments.js';
export { RunningMoments } from './running-moments.js';
export { median, medianAbsoluteDeviation } from './median.js';
export { fitGaussian, MAD_TO_SIGMA, MEAN_AD_TO_SIGMA, type GaussianFit } from './fit.js';
export {
  gaussianDensity,
  gaussianLogDensity,
  plugInRelativeDensity,
  predictiveRelativeDensity,
  predictiveScale,
} from './density.js';
export { normalTail, studentTail, cutoffSigma, cutoffLevel, type Side } from './tails.js';
export { toFitScale, fromFitScale } from './transform.js';
export { adjustTails, type FamilyMethod } from './family.js';
export { checkRows } from './matrix-input.js';
export { shrunkCovariance, type ShrunkCovariance } from './ledoit-wolf.js';
export { mahalanobisSquared, mahalanobisContributions } from './mahalanobis.js';
export { chiSquareTail, hotellingTail } from './hotelling.js';
export { detectChangePoints, type ChangePointOptions } from './change-points.js';
export { skewness, andersonDarling, andersonDarlingPValue, type AndersonDarling } from './normality.js';
