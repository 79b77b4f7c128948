export { InputError } from './input-error.js';
export { meanAndSquares, mean, variance } from './moments.js';
export { median, medianAbsoluteDeviation } from './median.js';
export { fitGaussian, MAD_TO_SIGMA, type GaussianFit } from './fit.js';
export {
  gaussianDensity,
  gaussianLogDensity,
  plugInRelativeDensity,
  predictiveRelativeDensity,
  predictiveScale,
} from './density.js';
export { normalTail, studentTail, cutoffSigma, cutoffLevel, type Side } from './tails.js';
export { toFitScale, fromFitScale } from './transform.js';
