export const id = 718;
export const ids = [718];
export const modules = {

/***/ 8129:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  R: () => (/* binding */ runGate)
});

// EXTERNAL MODULE: ./src/config/rules.ts
var rules = __webpack_require__(5413);
// EXTERNAL MODULE: ./src/model/tails.ts + 2 modules
var tails = __webpack_require__(7963);
// EXTERNAL MODULE: ./src/gate/decide-metric.ts
var decide_metric = __webpack_require__(8176);
// EXTERNAL MODULE: ./src/model/family.ts
var model_family = __webpack_require__(7089);
// EXTERNAL MODULE: ./src/gate/format-number.ts
var format_number = __webpack_require__(9616);
;// CONCATENATED MODULE: ./src/gate/family-test.ts


/**
 * Adjusts the tails of all decisions of a run for being made together (issue 6) and returns each
 * decision's test: adjusted tail below its level. Bonferroni and Holm (1979) bound the chance of
 * any false alarm in the run; fdr (Benjamini & Hochberg 1995) bounds the share of false alarms
 * among the flagged. With `none` the caller keeps its plain tests; this returns an empty list.
 * @example familyTests([{ tail: 1e-5, level: 0.0024 }], 'holm')[0].test.significant // true
 */
function familyTests(items, family) {
    if (family === 'none' || items.length === 0)
        return [];
    const adjusted = (0,model_family/* adjustTails */.F)(items.map((item) => item.tail), family);
    return items.map((item, i) => {
        const a = adjusted[i];
        const significant = a < item.level;
        const phrase = `tail ${(0,format_number/* formatNumber */.Z)(item.tail)}, ${family}-adjusted over ${items.length} to ${(0,format_number/* formatNumber */.Z)(a)} ` +
            `${significant ? '<' : '≥'} level ${(0,format_number/* formatNumber */.Z)(item.level)}`;
        return { adjusted: a, test: { significant, phrase } };
    });
}

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/model/special/log-gamma.ts
var log_gamma = __webpack_require__(2231);
;// CONCATENATED MODULE: ./src/model/special/incomplete-gamma.ts

const TINY = 1e-300;
const TOLERANCE = 4 * Number.EPSILON;
/**
 * x^a e^-x / Gamma(a). For a >= 10 Stirling's formula gives
 * sqrt(a / (2 pi)) exp(a log1pMinus((x - a) / a) - mu(a)): x - a is exact near the peak, so large
 * a loses nothing to cancelling logarithms (cf. Temme; DiDonato & Morris 1986, ACM TOMS 12).
 */
function gammaFront(a, x) {
    if (a >= log_gamma/* STIRLING_FROM */.k0) {
        const u = (x - a) / a;
        // Far below the peak 1 + u has lost digits; ln(x / a) is exact enough there.
        const power = u > -0.5 ? a * (0,log_gamma/* log1pMinus */._g)(u) : a * Math.log(x / a) - (x - a);
        return Math.sqrt(a / (2 * Math.PI)) * Math.exp(power - (0,log_gamma/* stirlingCorrection */.np)(a));
    }
    return Math.exp(a * Math.log(x) - x - (0,log_gamma/* logGamma */.SX)(a));
}
/** sum_n x^n / (a (a + 1) ... (a + n)) (A&S 6.5.29; Numerical Recipes 3rd ed., 6.2.5). */
function gammaSeries(a, x) {
    let term = 1 / a;
    let sum = term;
    const steps = 1000 + Math.ceil(50 * Math.sqrt(a));
    for (let n = 1; n <= steps; n++) {
        term *= x / (a + n);
        sum += term;
        if (Math.abs(term) < Math.abs(sum) * TOLERANCE)
            break;
    }
    return sum;
}
/**
 * The continued fraction of Gamma(a, x) e^x x^-a (A&S 6.5.31; Numerical Recipes 3rd ed., 6.2.7)
 * by the modified Lentz method; for x >= a + 1.
 */
function gammaFraction(a, x) {
    let b = x + 1 - a;
    let c = 1 / TINY;
    let d = 1 / b;
    let h = d;
    const steps = 1000 + Math.ceil(50 * Math.sqrt(a));
    for (let i = 1; i <= steps; i++) {
        const an = -i * (i - a);
        b += 2;
        d = an * d + b;
        if (Math.abs(d) < TINY)
            d = TINY;
        c = b + an / c;
        if (Math.abs(c) < TINY)
            c = TINY;
        d = 1 / d;
        const delta = d * c;
        h *= delta;
        if (Math.abs(delta - 1) < TOLERANCE)
            break;
    }
    return h;
}
/**
 * The regularised incomplete gamma function P(a, x) (upper = false) or Q(a, x) = 1 - P(a, x)
 * (upper = true), a > 0, x >= 0: the series for x < a + 1, the continued fraction above, each
 * computing its own side directly and the other as 1 minus it (the directly computed side is
 * the smaller one, or close to it), so far tails keep their relative accuracy. NaN for a <= 0,
 * x < 0 or NaN.
 * @example regularizedGamma(1, 2, true) // e^-2 = 0.1353352832366127
 */
function incomplete_gamma_regularizedGamma(a, x, upper) {
    if (!(a > 0) || !(x >= 0))
        return Number.NaN;
    if (x === 0)
        return upper ? 1 : 0;
    if (x === Infinity)
        return upper ? 0 : 1;
    if (x < a + 1) {
        const lower = gammaFront(a, x) * gammaSeries(a, x);
        return Math.min(1, Math.max(0, upper ? 1 - lower : lower));
    }
    const tail = gammaFront(a, x) * gammaFraction(a, x);
    return Math.min(1, Math.max(0, upper ? tail : 1 - tail));
}

;// CONCATENATED MODULE: ./src/model/special/chi-square.ts

/**
 * Upper tail P(chi^2_k > q) = Q(k/2, q/2) (chi-square is the gamma law of shape k/2 and scale 2), computed directly for far tails.
 * NaN for NaN input or k <= 0; 1 for q <= 0.
 * @example chiSquareUpperTail(3.841458820694124, 1) // ≈ 0.05
 */
function chiSquareUpperTail(q, k) {
    if (Number.isNaN(q))
        return Number.NaN;
    return incomplete_gamma_regularizedGamma(k / 2, Math.max(0, q / 2), true);
}
/**
 * Lower tail (CDF) P(chi^2_k <= q) = P(k/2, q/2).
 * @example chiSquareCdf(2, 2) // 1 - e^-1 = 0.6321205588285577
 */
function chiSquareCdf(q, k) {
    if (Number.isNaN(q))
        return Number.NaN;
    return regularizedGamma(k / 2, Math.max(0, q / 2), false);
}

// EXTERNAL MODULE: ./src/model/special/incomplete-beta.ts
var incomplete_beta = __webpack_require__(916);
;// CONCATENATED MODULE: ./src/model/special/fisher-f.ts

/**
 * Upper tail P(F > f) of Fisher's F with d1 and d2 degrees of freedom:
 * I_x(d2/2, d1/2) with x = d2 / (d2 + d1 f) (A&S 26.6.2), from the odds d1 f / d2 so that a far
 * tail is computed directly. 1 for f <= 0; NaN for NaN input or d1, d2 not above 0.
 * @example fisherUpperTail(4.964602743730711, 1, 10) // ≈ 0.05
 */
function fisherUpperTail(f, d1, d2) {
    if (Number.isNaN(f) || !(d1 > 0 && d2 > 0))
        return Number.NaN;
    if (f <= 0)
        return 1;
    return (0,incomplete_beta/* regularizedBeta */.RL)(d2 / 2, d1 / 2, (0,incomplete_beta/* betaPointFromOdds */.rP)((d1 * f) / d2), false);
}
/**
 * Lower tail (CDF) P(F <= f) = 1 - I_x(d2/2, d1/2) = I_(1-x)(d1/2, d2/2), computed directly.
 * @example fisherCdf(1, 4, 4) // 0.5
 */
function fisherCdf(f, d1, d2) {
    if (Number.isNaN(f) || !(d1 > 0 && d2 > 0))
        return Number.NaN;
    if (f <= 0)
        return 0;
    return regularizedBeta(d2 / 2, d1 / 2, betaPointFromOdds((d1 * f) / d2), true);
}

;// CONCATENATED MODULE: ./src/model/hotelling.ts



function checkDistance(d2, p) {
    if (!(d2 >= 0)) {
        throw new input_error/* InputError */.d(`a squared distance must be a number, 0 or more, got ${d2}`);
    }
    if (!Number.isInteger(p) || p < 1)
        throw new input_error/* InputError */.d(`the number of metrics must be 1 or more, got ${p}`);
}
/**
 * P(chi^2_p > d2): the tail of a squared Mahalanobis distance when mean and covariance are known
 * exactly (the large-history limit of hotellingTail): the upper incomplete gamma Q(p/2, d2/2),
 * computed directly, so far tails keep their relative accuracy. An infinite d2 has tail 0.
 * Throws InputError on a negative or NaN d2 or p < 1.
 * @example chiSquareTail(3.841458820645, 1) // ≈ 0.05 (chi-square table, 1 degree of freedom)
 */
function chiSquareTail(d2, p) {
    checkDistance(d2, p);
    if (d2 === Infinity)
        return 0;
    return chiSquareUpperTail(d2, p);
}
/**
 * Tail probability of a NEW run's squared Mahalanobis distance d2 from a mean and covariance
 * estimated from n earlier runs (the prediction form of Hotelling's T^2).
 * `divisor` says which covariance d2 was computed with: 'mle' (divide by n, as shrunkCovariance
 * returns; the default) or 'unbiased' (divide by n - 1). With the n-1 covariance S_u,
 *   T^2 = d2_u n / (n + 1),  F = T^2 (n - p) / (p (n - 1)) ~ F(p, n - p)
 * (x_new - mean has covariance Sigma (1 + 1/n), independent of S_u). Since S_mle = S_u (n-1)/n,
 * d2_u = d2_mle (n - 1) / n. The F tail is computed directly as an incomplete beta — no 1 - cdf
 * cancellation. Needs n > p. With a shrunk covariance this is an approximation (the F law holds
 * for the plain sample covariance). Throws InputError on bad d2, p < 1 or n <= p.
 *
 * @example hotellingTail(0, 2, 10) // 1
 */
function hotellingTail(d2, p, n, divisor = 'mle') {
    checkDistance(d2, p);
    if (!Number.isInteger(n) || n <= p) {
        throw new input_error/* InputError */.d(`the joint check of ${p} metrics needs more than ${p} runs, got ${n}`, {
            fix: 'wait for more baseline runs, or check fewer metrics together',
        });
    }
    if (d2 === 0)
        return 1;
    if (d2 === Infinity)
        return 0;
    const unbiased = divisor === 'mle' ? (d2 * (n - 1)) / n : d2;
    const t2 = (unbiased * n) / (n + 1);
    const statistic = (t2 * (n - p)) / (p * (n - 1));
    return fisherUpperTail(statistic, p, n - p);
}

;// CONCATENATED MODULE: ./src/model/matrix-input.ts

/**
 * Checks a table of runs x metrics: at least `minRows` rows, all of one length >= 1, all finite.
 * Returns the number of columns. Throws InputError naming the row and column of the problem.
 * @example checkRows([[1, 2], [3, 4]], 2) // 2
 */
function checkRows(rows, minRows) {
    if (rows.length < minRows) {
        throw new input_error/* InputError */.d(`need at least ${minRows} runs, got ${rows.length}`);
    }
    const p = rows[0]?.length ?? 0;
    if (p === 0)
        throw new input_error/* InputError */.d('each run needs at least one value');
    rows.forEach((row, r) => {
        if (row.length !== p) {
            throw new input_error/* InputError */.d(`run ${r + 1} has ${row.length} values, the first run has ${p}`, {
                fix: 'give every run a value for every metric (drop runs or metrics with gaps first)',
            });
        }
        row.forEach((x, c) => {
            if (!Number.isFinite(x)) {
                throw new input_error/* InputError */.d(`value ${x} of run ${r + 1}, column ${c + 1} is not a finite number`);
            }
        });
    });
    return p;
}

;// CONCATENATED MODULE: ./src/model/matrix-library.ts
let library;
/**
 * ml-matrix, loaded on first use: only the joint check of metric groups needs it, and loading it
 * costs a `check` without groups several milliseconds at start-up. A synchronous require (the
 * bundler turns it into a lazy module load) keeps shrunkCovariance and the Mahalanobis functions
 * synchronous.
 * @example matrixLibrary().Matrix.eye(2).get(0, 0) // 1
 */
function matrixLibrary() {
    library ??= __webpack_require__(3076);
    return library;
}

;// CONCATENATED MODULE: ./src/model/ledoit-wolf.ts


/**
 * Covariance of runs x metrics that stays well conditioned when runs are few for the number of
 * metrics: S* = lambda D + (1 - lambda) S, with S the sample covariance dividing by n and D its
 * diagonal (variances kept, covariances zeroed). The intensity is the Ledoit-Wolf optimum
 * (Ledoit & Wolf 2004, "A well-conditioned estimator for large-dimensional covariance matrices")
 * for the diagonal target ("target D" of Schäfer & Strimmer 2005):
 *   lambda = sum_{i != j} Var(s_ij) / sum_{i != j} s_ij^2,  clipped to [0, 1],
 *   Var(s_ij) = (1/n^2) sum_k (w_kij - s_ij)^2,  w_kij = (x_ki - mean_i)(x_kj - mean_j).
 * (Schäfer & Strimmer write the same with the n-1 covariance: n/(n-1)^3 sum_k (w_kij - w̄_ij)^2;
 * the two agree as n grows.) With one metric, or no off-diagonal covariance at all, there is
 * nothing to shrink and lambda is 0. O(n p^2). Throws InputError on fewer than 2 runs, ragged
 * rows or non-finite values.
 *
 * @example shrunkCovariance([[1, 2], [2, 4], [3, 6], [4, 7]]).shrinkage // between 0 and 1
 */
function shrunkCovariance(rows) {
    const p = checkRows(rows, 2);
    const n = rows.length;
    const { Matrix } = matrixLibrary();
    const x = new Matrix(rows.map((row) => [...row]));
    const mean = x.mean('column');
    // Centring first keeps large offsets (timings around 1e9 ns) from swamping the products.
    x.subRowVector(mean);
    const sample = x.transpose().mmul(x).div(n);
    // sum_k w_kij^2 = sum_k x_ki^2 x_kj^2, so sum_k (w_kij - s_ij)^2 = that - n s_ij^2.
    const squared = x.clone().mul(x);
    const fourth = squared.transpose().mmul(squared);
    let varianceSum = 0;
    let offSquares = 0;
    for (let i = 0; i < p; i++) {
        for (let j = 0; j < p; j++) {
            if (i === j)
                continue;
            const s = sample.get(i, j);
            varianceSum += Math.max(0, fourth.get(i, j) - n * s * s) / (n * n);
            offSquares += s * s;
        }
    }
    const shrinkage = offSquares > 0 ? Math.min(1, Math.max(0, varianceSum / offSquares)) : 0;
    const covariance = sample.to2DArray().map((row, i) => row.map((s, j) => (i === j ? s : (1 - shrinkage) * s)));
    return { mean, covariance, shrinkage };
}

;// CONCATENATED MODULE: ./src/model/mahalanobis.ts


/**
 * Ridges tried, relative to the mean variance, when the covariance is not positive definite
 * (a metric that never varied, or two metrics that always move together). 1e-10 leaves any
 * well-conditioned matrix untouched in practice; 1e-6 is the most we add before giving up.
 */
const RELATIVE_RIDGES = [0, 1e-10, 1e-8, 1e-6];
/** Solves covariance * y = d by Cholesky, adding the smallest ridge that makes it factor. */
function solveCovariance(d, covariance) {
    const p = d.length;
    if (covariance.length !== p || covariance.some((row) => row.length !== p)) {
        throw new input_error/* InputError */.d(`the covariance must be ${p} x ${p} to match ${p} values`);
    }
    if (covariance.some((row) => row.some((v) => !Number.isFinite(v)))) {
        throw new input_error/* InputError */.d('the covariance holds a value that is not a finite number');
    }
    let trace = 0;
    for (let i = 0; i < p; i++)
        trace += covariance[i][i];
    if (!(trace > 0)) {
        throw new input_error/* InputError */.d('the covariance has no positive variance', {
            fix: 'give the metrics a resolution, or leave constant metrics out of the joint check',
        });
    }
    const { CholeskyDecomposition, Matrix } = matrixLibrary();
    for (const relative of RELATIVE_RIDGES) {
        const ridge = (relative * trace) / p;
        const matrix = new Matrix(covariance.map((row, i) => row.map((v, j) => (i === j ? v + ridge : v))));
        const cholesky = new CholeskyDecomposition(matrix);
        if (cholesky.isPositiveDefinite())
            return cholesky.solve(Matrix.columnVector(d)).getColumn(0);
    }
    throw new input_error/* InputError */.d('the covariance is not positive definite, even with a small ridge', {
        fix: 'drop metrics that are copies or linear combinations of others, or use more runs',
    });
}
function difference(x, mean) {
    if (x.length !== mean.length || x.length === 0) {
        throw new input_error/* InputError */.d(`the point has ${x.length} values, the mean has ${mean.length}`);
    }
    return x.map((v, i) => {
        const d = v - mean[i];
        if (!Number.isFinite(d))
            throw new input_error/* InputError */.d(`value ${v} at position ${i + 1} is not a finite number`);
        return d;
    });
}
/**
 * Squared Mahalanobis distance d^2 = (x - mean)' S^-1 (x - mean): how far a run lies from the
 * baseline in units of its covariance S (whatever divisor S was computed with; see hotellingTail).
 * Solved by Cholesky, not by an explicit inverse. A near-singular S gets the smallest ridge
 * (1e-10, 1e-8 or 1e-6 of the mean variance) that lets it factor; beyond that, InputError.
 * O(p^3). Throws InputError on mismatched sizes, non-finite values or a hopeless covariance.
 *
 * @example mahalanobisSquared([1, 1], [0, 0], [[1, 0], [0, 4]]) // 1.25
 */
function mahalanobisSquared(x, mean, covariance) {
    return mahalanobisContributions(x, mean, covariance).reduce((sum, c) => sum + c, 0);
}
/**
 * Each coordinate's share of d^2: c_i = d_i (S^-1 d)_i with d = x - mean, so sum c_i = d^2.
 * Shows which metrics drive a joint alarm. A share can be negative: with correlated metrics, a
 * coordinate that moved "as expected" given the others reduces the distance.
 *
 * @example mahalanobisContributions([1, 1], [0, 0], [[1, 0], [0, 4]]) // [1, 0.25]
 */
function mahalanobisContributions(x, mean, covariance) {
    const d = difference(x, mean);
    const y = solveCovariance(d, covariance);
    return d.map((di, i) => di * y[i]);
}

// EXTERNAL MODULE: ./src/model/moments.ts
var moments = __webpack_require__(8884);
;// CONCATENATED MODULE: ./src/gate/analyse-group.ts





/**
 * Shares of the group's level. A change usually touches one benchmark, which the own moves find
 * far sooner than the distance (it spreads its power over every member), so they get 0.8; the
 * common move (everything slower) and the distance (broad patterns) keep 0.1 each. Spending the
 * level once for the whole group keeps its false alarms at the level, not three times it.
 */
const OWN_WEIGHT = 0.8;
const COMMON_WEIGHT = 0.1;
const DISTANCE_WEIGHT = 0.1;
/**
 * Analyses a group of metrics judged together (issue 6):
 * - joint: squared Mahalanobis distance of this run from the baseline mean, covariance shrunk
 *   toward its diagonal (Ledoit & Wolf 2004), tail by Hotelling's T^2 for a new observation
 *   (chi-square, reported only, when runs do not exceed members: Hotelling's law is undefined);
 * - common move c = mean of the signed standardised values, judged against the common move of
 *   each baseline run (predictive Student-t, n - 1 dof), so a slow runner within what runners
 *   have shown passes while a slowdown of everything beyond it does not;
 * - own moves o_j = u_j - c, each judged against its own history; a single metric that moved
 *   shows here with its own noise only, which is much smaller than the runner's.
 * The Mahalanobis distance spreads its power over p directions, so a lone moved member is found
 * far sooner by the largest own move (a union-intersection check, Bonferroni over members); the
 * group's tail is the weighted Bonferroni combination of the three checks, one test at its level.
 * O(n p^2 + p^3). Needs at least 3 rows and 2 members (the caller checks).
 * @example analyseGroup(frame).tail // 0.73 for an ordinary run
 */
function analyseGroup(frame) {
    const { rows, current } = frame;
    const n = rows.length;
    const p = current.length;
    const commons = rows.map(average);
    const now = average(current);
    const common = judgeMove(commons, now);
    const own = current.map((u, j) => judgeMove(rows.map((row, i) => row[j] - commons[i]), u - now));
    const ownTail = Math.min(1, p * Math.min(...own.map((m) => m.tail)));
    const shrunk = shrunkCovariance(rows);
    const contributions = mahalanobisContributions(current, shrunk.mean, shrunk.covariance);
    const distance = Math.max(0, contributions.reduce((sum, c) => sum + c, 0));
    const distanceTail = n > p ? hotellingTail(distance, p, n) : chiSquareTail(distance, p);
    return {
        n,
        p,
        common,
        own,
        ownTail,
        distance,
        distanceTail,
        shrinkage: shrunk.shrinkage,
        shares: contributions.map((c) => (distance > 0 ? c / distance : 0)),
        tail: Math.min(1, ownTail / OWN_WEIGHT, common.tail / COMMON_WEIGHT, n > p ? distanceTail / DISTANCE_WEIGHT : 1),
    };
}
const MIN_MOVE_SD = 1e-6;
/** A new value against the history of the same quantity: z and the predictive t tail. */
function judgeMove(history, value) {
    const { n, mean, squares } = (0,moments/* meanAndSquares */.R7)(history);
    // Values are in member sd units; a history with no spread at all (members moving in perfect
    // lockstep) gets a floor of 1e-6 of a member's sd, far below any real noise, so a move off it
    // is extreme instead of undefined.
    const sd = Math.max(Math.sqrt(squares / (n - 1)), MIN_MOVE_SD);
    const z = (value - mean) / sd;
    return { z, tail: (0,tails/* studentTail */.gq)(z / Math.sqrt(1 + 1 / n), n - 1, 'both') };
}
function average(values) {
    let sum = 0;
    for (const v of values)
        sum += v;
    return sum / values.length;
}

;// CONCATENATED MODULE: ./src/gate/decide-group.ts



/** A member counts as a main contributor when its share is at least this part of the largest. */
const MAIN_SHARE = 0.5;
/**
 * Decides a judged group and its members. `test` is the group's tail (raw, or adjusted by family
 * control) against the level; when it fires, the checks whose weighted tail is below the level
 * are the finding (see OWN_WEIGHT). Members follow it:
 * - when the common move is beyond its history, every member that moved that way with it is;
 * - otherwise, when the group's test fires, a main contributor (own move significant on its own at the
 *   own moves' share of the level, or a Mahalanobis share >= half the largest) is regressed or improved by
 *   the side its own move lies on, beyond the tolerance;
 * - everyone else is ok, even if alone it would have looked far off: the group explains it.
 * The group is regressed when a member is, improved when a member is and none regressed.
 * @example decideGroup('timings', frame, analysis, 0.0024, test).group.status // 'ok'
 */
function decideGroup(name, frame, analysis, level, test) {
    const commonFired = test.significant && analysis.common.tail / COMMON_WEIGHT < level;
    const commonStatus = commonFired ? (analysis.common.z > 0 ? 'regressed' : 'improved') : 'ok';
    const maxShare = Math.max(...analysis.shares);
    const members = frame.members.map((input, j) => {
        const own = analysis.own[j];
        const share = analysis.shares[j];
        const main = (own.tail * analysis.p) / OWN_WEIGHT < level ||
            (analysis.n > analysis.p && analysis.distanceTail / DISTANCE_WEIGHT < level && share >= MAIN_SHARE * maxShare);
        const describe = `in group ${name}: own move ${signed(own.z)} sd, ${(0,format_number/* formatPercent */.l)(share)} of the joint distance`;
        const single = input.score;
        const withCommon = (commonStatus === 'regressed' && single.direction === 'worse') ||
            (commonStatus === 'improved' && single.direction === 'better');
        const commonPhrase = `common move ${signed(analysis.common.z)} sd, tail ${(0,format_number/* formatNumber */.Z)(analysis.common.tail)}`;
        if (withCommon) {
            return (0,decide_metric/* decideMetric */.nR)(single, { significant: true, phrase: `${describe}; ${commonPhrase}, beyond the group's history; ${test.phrase}` });
        }
        if (test.significant && main) {
            const direction = ownDirection(own.z, single.settings.worse === 'both');
            return (0,decide_metric/* decideMetric */.nR)({ ...single, direction }, { significant: true, phrase: `${describe}; ${test.phrase}` });
        }
        const quiet = `${describe}; ${commonPhrase} within the group's history; ${test.phrase}`;
        return { ...(0,decide_metric/* decideMetric */.nR)(single, { significant: false, phrase: quiet }), group: name };
    });
    for (const m of members)
        m.group = name;
    const status = members.some((m) => m.status === 'regressed')
        ? 'regressed'
        : members.some((m) => m.status === 'improved')
            ? 'improved'
            : 'ok';
    const group = {
        name,
        status,
        members: frame.members.map((input, j) => ({
            name: input.score.result.name,
            share: analysis.shares[j],
            ownZ: analysis.own[j].z,
        })),
        n: analysis.n,
        distance: analysis.distance,
        tail: analysis.tail,
        level,
        common: { z: analysis.common.z, tail: analysis.common.tail, status: commonStatus },
        shrinkage: analysis.shrinkage,
        reason: groupReason(status, analysis, test, commonStatus, level),
    };
    return { group, members };
}
function ownDirection(z, both) {
    if (z === 0)
        return 'none';
    return z > 0 || both ? 'worse' : 'better';
}
function signed(x) {
    return `${x >= 0 ? '+' : '-'}${(0,format_number/* formatNumber */.Z)(Math.abs(x))}`;
}
function groupReason(status, a, test, common, level) {
    const joint = `distance ${(0,format_number/* formatNumber */.Z)(a.distance)} over ${a.p} metrics and ${a.n} runs; ${test.phrase}`;
    const commonText = `common move ${signed(a.common.z)} sd (tail ${(0,format_number/* formatNumber */.Z)(a.common.tail)}, level ${(0,format_number/* formatNumber */.Z)(level)})`;
    if (common !== 'ok')
        return `${commonText} is beyond the group's history; ${joint}`;
    return `${status === 'ok' ? 'no member moved beyond the group' : 'a member moved on its own'}; ${joint}; ${commonText}`;
}

// EXTERNAL MODULE: ./src/gate/resolution-floor.ts
var resolution_floor = __webpack_require__(1198);
// EXTERNAL MODULE: ./src/gate/sides.ts
var sides = __webpack_require__(3979);
;// CONCATENATED MODULE: ./src/gate/group-frame.ts



/**
 * Aligns the members' windows (before any change-point shortening) on the runs they share and standardises each column by its mean
 * and n-1 sd over those runs (sd floored at the member's resolution). A member whose column has
 * no spread cannot be standardised and is left out (`dropped`), to be judged alone.
 * O(runs x members).
 * @example frameGroup(members).rows.length // number of shared baseline runs
 */
function frameGroup(inputs) {
    const shared = sharedRunIds(inputs);
    const members = [];
    const dropped = [];
    const columns = [];
    const current = [];
    for (const input of inputs) {
        const byRun = new Map();
        const whole = input.baseline.window ?? input.baseline;
        whole.runIds.forEach((id, i) => byRun.set(id, whole.values[i]));
        const column = shared.map((id) => byRun.get(id));
        const { settings } = input.score;
        const stats = column.length >= 2 ? (0,moments/* meanAndSquares */.R7)(column) : { n: column.length, mean: 0, squares: 0 };
        const floor = (0,resolution_floor/* fitScaleFloor */.c)(settings.resolution, settings.transform, stats.mean);
        const sd = Math.max(Math.sqrt(stats.squares / Math.max(stats.n - 1, 1)), floor);
        if (!(sd > 0) || input.score.current === undefined) {
            dropped.push(input);
            continue;
        }
        const sign = (0,sides/* worseSign */.C)(settings.worse);
        members.push(input);
        columns.push(column.map((x) => (sign * (x - stats.mean)) / sd));
        current.push((sign * (input.score.current - stats.mean)) / sd);
    }
    const rows = shared.map((_, i) => columns.map((column) => column[i]));
    return { members, rows, current, dropped };
}
/** Run ids present in every member's whole window, in the first member's (history) order. */
function sharedRunIds(inputs) {
    const [first, ...others] = inputs;
    if (first === undefined)
        return [];
    const ids = (input) => (input.baseline.window ?? input.baseline).runIds;
    const sets = others.map((input) => new Set(ids(input)));
    return ids(first).filter((id) => sets.every((set) => set.has(id)));
}

;// CONCATENATED MODULE: ./src/gate/judge-groups.ts






/**
 * Gathers the scored metrics of each configured group (`groups:` in the config) and analyses the
 * groups that can be judged: at least 2 members with spread and as many shared baseline runs as
 * the members' largest `min-runs` (and 3). Others come back as `learning` groups whose members
 * stay judged alone. The group's level is cutoffLevel of its strictest member's cutoff.
 * @example judgeGroups(config, entries, groupOf).judged.has('bench/parse') // true
 */
function judgeGroups(config, entries, groupOf) {
    const judged = new Set();
    const pending = [];
    const learning = [];
    const byGroup = new Map();
    for (const entry of entries) {
        const group = groupOf(entry.score.result.name);
        if (group !== undefined)
            byGroup.set(group, [...(byGroup.get(group) ?? []), entry]);
    }
    for (const spec of config.groups) {
        const inputs = byGroup.get(spec.name);
        if (inputs === undefined)
            continue;
        const frame = frameGroup(inputs);
        const level = Math.min(...inputs.map((e) => (0,tails/* cutoffLevel */.yp)(e.score.settings.cutoff)));
        const minRows = Math.max(3, ...inputs.map((e) => e.score.settings.minRuns));
        if (frame.members.length < 2 || frame.rows.length < minRows) {
            learning.push(learningGroup(spec.name, frame.members.length, frame.rows.length, minRows, level));
            continue;
        }
        let analysis;
        try {
            analysis = analyseGroup(frame);
        }
        catch (error) {
            // A covariance no ridge can rescue (members that are exact copies of each other): say so
            // and judge the members alone rather than stop the whole gate.
            if (!(error instanceof input_error/* InputError */.d))
                throw error;
            const reason = `cannot be judged together: ${error.message}; members are judged alone`;
            learning.push({ ...learningGroup(spec.name, frame.members.length, frame.rows.length, minRows, level), reason });
            continue;
        }
        for (const member of frame.members)
            judged.add(member.score.result.name);
        pending.push({
            analysis,
            level,
            decide(family) {
                const significant = analysis.tail < level;
                const test = family?.test ?? {
                    significant,
                    phrase: `joint tail ${(0,format_number/* formatNumber */.Z)(analysis.tail)} ${significant ? '<' : '≥'} level ${(0,format_number/* formatNumber */.Z)(level)}`,
                };
                const decided = decideGroup(spec.name, frame, analysis, level, test);
                Object.assign(decided.group, { distanceTail: analysis.distanceTail, ownTail: analysis.ownTail });
                if (family !== undefined)
                    decided.group.adjusted = family.adjusted;
                return decided;
            },
        });
    }
    return { judged, pending, learning };
}
function learningGroup(name, members, rows, minRows, level) {
    const reason = members < 2
        ? `only ${members} member${members === 1 ? '' : 's'} with enough varying history; a group needs 2`
        : `only ${rows} baseline runs hold every member; ${minRows} needed`;
    return {
        name,
        status: 'learning',
        members: [],
        n: rows,
        distance: 0,
        tail: 1,
        level,
        common: { z: 0, tail: 1, status: 'ok' },
        shrinkage: 0,
        reason: `${reason}; members are judged alone until then`,
    };
}

// EXTERNAL MODULE: ./src/gate/baseline.ts + 1 modules
var gate_baseline = __webpack_require__(4614);
// EXTERNAL MODULE: ./src/gate/judge-metric.ts
var judge_metric = __webpack_require__(1177);
;// CONCATENATED MODULE: ./src/gate/judge-name.ts



/**
 * Every metric named by this run or holding a value in the history, in code-unit order (the same
 * on every machine). Names come from Maps, so `__proto__` is an ordinary name.
 * @example metricNames(history, run) // ['bundle/app.js', 'time/parse']
 */
function metricNames(history, run) {
    const names = new Set(run.metrics.keys());
    for (const [name, column] of history.columns) {
        if (!names.has(name) && holdsValue(column.values))
            names.add(name);
    }
    // The default sort compares strings by UTF-16 code units, the same order as `<`, without a
    // callback per comparison.
    return [...names].sort();
}
/** Whether any value is finite (a plain loop: `some` with a closure costs more per metric). */
function holdsValue(values) {
    for (let i = 0; i < values.length; i++)
        if (Number.isFinite(values[i]))
            return true;
    return false;
}
/**
 * One metric up to its single-metric score: `ignored` by a rule, `missing` from this run, `new`,
 * `learning`, or a scored entry (with its baseline) that groups and family control decide on.
 * With `relative-to`, this run's value becomes metric / reference; a run lacking a usable
 * reference gets a result that says so instead of a crash.
 * @example judgeName(config, history, run, 'time/parse') // { score, baseline }
 */
function judgeName(config, history, run, name) {
    const settings = (0,rules/* settingsFor */.z)(config, name);
    const measurement = run.metrics.get(name);
    if (settings.ignore) {
        return { result: { ...plain(name, settings), ...own(measurement), status: 'ignored', reason: 'matched a rule with ignore: true' } };
    }
    const baseline = (0,gate_baseline/* selectBaseline */.w)(history, name, settings);
    if (measurement === undefined) {
        const runs = `${baseline.available} run${baseline.available === 1 ? '' : 's'}`;
        return { result: { ...plain(name, settings), status: 'missing', reason: `in the history (${runs}) but absent from this run` } };
    }
    let value = measurement.value;
    if (settings.relativeTo !== undefined) {
        const reference = run.metrics.get(settings.relativeTo)?.value;
        if (reference === undefined || !Number.isFinite(reference) || reference === 0) {
            const lacks = reference === undefined ? 'lacks' : `has ${reference} for`;
            const reason = `cannot be judged relative to ${settings.relativeTo}: this run ${lacks} that metric`;
            const status = baseline.values.length === 0 ? 'new' : 'missing';
            return { result: { ...plain(name, settings), ...own(measurement), status, reason } };
        }
        value /= reference;
    }
    // Set key by key rather than spread: this runs once per metric.
    const extras = { count: measurement.count };
    // a ratio has no unit
    if (measurement.unit !== undefined && settings.relativeTo === undefined)
        extras.unit = measurement.unit;
    if (baseline.since !== undefined)
        extras.since = baseline.since;
    if (baseline.relativeTo !== undefined)
        extras.relativeTo = baseline.relativeTo;
    const score = (0,judge_metric/* scoreMetric */.zN)(name, settings, baseline.values, value, extras);
    return score.scored ? { score, baseline } : { result: score.result };
}
/** The fields every result of this metric starts with. */
function plain(name, settings) {
    return { name, cutoff: settings.cutoff, worse: settings.worse };
}
/** This run's own value, count and unit, for the results that are not scored. */
function own(measurement) {
    if (measurement === undefined)
        return {};
    const fields = { value: measurement.value, count: measurement.count };
    if (measurement.unit !== undefined)
        fields.unit = measurement.unit;
    return fields;
}

;// CONCATENATED MODULE: ./src/gate/report.ts
const REPORT_SCHEMA = 'bellgate.report/1';

;// CONCATENATED MODULE: ./src/gate/verdict.ts
/**
 * The run's verdict (DESIGN.md): `regressed` when any metric or group regressed (`accepted`
 * instead when the pull request carries the accept label); `learning` when no metric had enough
 * history to be judged; otherwise `pass`.
 * @example decideVerdict([{ status: 'ok' }], [], false) // 'pass'
 */
function decideVerdict(metrics, groups, accepted) {
    const regressed = metrics.some((m) => m.status === 'regressed') || groups.some((g) => g.status === 'regressed');
    if (regressed)
        return accepted ? 'accepted' : 'regressed';
    const judged = metrics.some((m) => JUDGED.has(m.status)) || groups.some((g) => g.status !== 'learning');
    return judged ? 'pass' : 'learning';
}
/** Statuses that mean the metric had enough history to be judged. */
const JUDGED = new Set(['ok', 'regressed', 'improved']);
const RANK = {
    regressed: 0,
    improved: 1,
    ok: 2,
    learning: 2,
    new: 2,
    missing: 2,
    ignored: 2,
};
/**
 * Report order: regressed first, then improved, then the rest, each by name (code-unit order,
 * the same on every machine). Returns a new array.
 * @example orderMetrics(results).map((m) => m.status) // ['regressed', 'improved', 'ok', 'new']
 */
function orderMetrics(metrics) {
    return [...metrics].sort((a, b) => RANK[a.status] - RANK[b.status] || (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
}

;// CONCATENATED MODULE: ./src/gate/gate.ts








/**
 * The decision (DESIGN.md "Statistics", issue 6): every metric of the run and of the history is
 * scored against its baseline (selectBaseline, scoreMetric); metrics in a configured group are
 * judged together (judgeGroups); with `family` set, the tails of all remaining decisions are
 * adjusted together (familyTests); then the verdict. Pure: no I/O, no clock.
 * Throws InputError for values the settings cannot take (e.g. <= 0 on the log scale).
 * @example runGate({ config: defaultConfig(), history, run, series: 'main' }).verdict // 'pass'
 */
function runGate(input) {
    const { config, history, run } = input;
    const finished = [];
    const scored = [];
    for (const name of metricNames(history, run)) {
        const entry = judgeName(config, history, run, name);
        if ('score' in entry)
            scored.push(entry);
        else
            finished.push(entry.result);
    }
    // Without groups or family control (the defaults) nothing below changes a lone score, so the
    // per-metric group lookups and cutoff levels are skipped.
    const groupOutcome = config.groups.length === 0 ? NO_GROUPS : judgeGroups(config, scored, (name) => (0,rules/* groupFor */.R)(config, name)?.name);
    const lone = groupOutcome.judged.size === 0 ? scored : scored.filter((e) => !groupOutcome.judged.has(e.score.result.name));
    const tests = config.family === 'none'
        ? []
        : familyTests([
            ...lone.map((e) => ({ tail: e.score.result.tail ?? 1, level: (0,tails/* cutoffLevel */.yp)(e.score.settings.cutoff) })),
            ...groupOutcome.pending.map((g) => ({ tail: g.analysis.tail, level: g.level })),
        ], config.family);
    const metrics = [...finished];
    lone.forEach((e, i) => metrics.push(decideLone(e.score, tests[i])));
    const groups = [...groupOutcome.learning];
    groupOutcome.pending.forEach((g, i) => {
        const decided = g.decide(tests[lone.length + i]);
        groups.push(decided.group);
        metrics.push(...decided.members);
    });
    return {
        schema: REPORT_SCHEMA,
        verdict: decideVerdict(metrics, groups, input.accepted === true),
        series: input.series,
        family: config.family,
        metrics: orderMetrics(metrics),
        groups: groups.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)),
    };
}
function decideLone(score, family) {
    if (family === undefined || !score.scored)
        return score.result;
    return { ...(0,decide_metric/* decideMetric */.nR)(score, family.test), adjusted: family.adjusted };
}
/** What judgeGroups returns when the config names no groups. */
const NO_GROUPS = {
    judged: new Set(),
    pending: [],
    learning: [],
};


/***/ }),

/***/ 6934:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Tx: () => (/* binding */ statusRank),
/* harmony export */   id: () => (/* binding */ STATUS_GLYPH),
/* harmony export */   pB: () => (/* binding */ VERDICT_HEADLINE),
/* harmony export */   rc: () => (/* binding */ statusCounts)
/* harmony export */ });
/* unused harmony export STATUS_ORDER */
/**
 * Order in which statuses are shown: what needs attention first. Also the default sort of every
 * table, so a reviewer sees regressions without scrolling.
 */
const STATUS_ORDER = ['regressed', 'improved', 'missing', 'ok', 'learning', 'new', 'ignored'];
/** Rank of a status in STATUS_ORDER (unknown statuses last). */
function statusRank(s) {
    const i = STATUS_ORDER.indexOf(s);
    return i < 0 ? STATUS_ORDER.length : i;
}
/**
 * A shape per status, so colour is never the only carrier (WCAG 1.4.1): triangles point the way the
 * metric moved against its baseline, a hollow circle for still learning.
 */
const STATUS_GLYPH = {
    regressed: '▲',
    improved: '▼',
    missing: '✕',
    ok: '●',
    learning: '◌',
    new: '✚',
    ignored: '–',
};
/** What each verdict means, in a sentence that follows the verdict word in every headline. */
const VERDICT_HEADLINE = {
    pass: 'no metric regressed',
    regressed: 'at least one metric fell in the improbable tail on its worse side',
    learning: 'no metric has enough baseline runs yet',
    accepted: 'regressions found, accepted by the pull request label',
};
/** Count of metrics per status, in STATUS_ORDER, omitting zeros. @example "2 regressed, 40 ok" */
function statusCounts(statuses) {
    const counts = new Map();
    for (const s of statuses)
        counts.set(s, (counts.get(s) ?? 0) + 1);
    return STATUS_ORDER.filter((s) => counts.has(s))
        .map((s) => `${counts.get(s)} ${s}`)
        .join(', ');
}


/***/ })

};
