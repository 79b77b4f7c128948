export { erfc, erfcScaled } from './erfc.js';
export { normalUpperTail, normalLogCdf, normalDensity, normalLogDensity } from './normal.js';
export { logGamma, logBeta, logGammaShift, stirlingCorrection, log1pMinus } from './log-gamma.js';
export { regularizedBeta, betaPointAt, betaPointFromOdds, type BetaPoint } from './incomplete-beta.js';
export { regularizedGamma } from './incomplete-gamma.js';
export { studentTwoSidedTail, studentUpperTail } from './student-t.js';
export { chiSquareUpperTail, chiSquareCdf } from './chi-square.js';
export { fisherUpperTail, fisherCdf } from './fisher-f.js';
