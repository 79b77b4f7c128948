# Generates mpmath-values.json: reference values of the special functions at 50 significant digits,
# from mpmath 1.3.0 (https://mpmath.org), for test/model/special/mpmath-values.test.ts.
#   python3 test/model/special/mpmath-values.py > test/model/special/mpmath-values.json
# Normal tails use mp.ncdf. The incomplete beta and gamma use their classic expansions evaluated in
# 50-digit arithmetic (A&S 26.5.8 continued fraction; A&S 6.5.29 series / 6.5.31 continued
# fraction, with mp.loggamma), because mp.betainc / mp.gammainc (hypergeometric series) give up
# for parameters in the thousands; for parameters up to 1000 the two must agree to 1e-30.
# Each entry also carries the condition number |x d ln P / d x| of the value in its argument: a
# double input is only known to half an ulp, so no implementation can beat ~eps times that.
import json
import random

import mpmath as mp

mp.mp.dps = 50
TINY = mp.mpf(10) ** -300
EPS = mp.mpf(10) ** -45


def beta_fraction(a, b, x):
    c, d = mp.mpf(1), 1 - (a + b) * x / (a + 1)
    d = 1 / (d if abs(d) > TINY else TINY)
    h = d
    for m in range(1, 10**7):
        for aa in (m * (b - m) * x / ((a - 1 + 2 * m) * (a + 2 * m)), -(a + m) * (a + b + m) * x / ((a + 2 * m) * (a + 1 + 2 * m))):
            d = 1 + aa * d
            d = d if abs(d) > TINY else TINY
            c = 1 + aa / c
            c = c if abs(c) > TINY else TINY
            d = 1 / d
            h *= d * c
        if abs(d * c - 1) < EPS:
            return h
    raise RuntimeError('no convergence')


def log_beta(a, b):
    return mp.loggamma(a) + mp.loggamma(b) - mp.loggamma(a + b)


def ibeta(a, b, x):
    """I_x(a, b) at 50 digits."""
    a, b, x = mp.mpf(a), mp.mpf(b), mp.mpf(x)
    if x > (a + 1) / (a + b + 2):
        return 1 - ibeta(b, a, 1 - x)
    value = mp.exp(a * mp.log(x) + b * mp.log(1 - x) - log_beta(a, b)) * beta_fraction(a, b, x) / a
    if max(a, b) <= 1000:
        check = mp.betainc(a, b, 0, x, regularized=True)
        assert abs(check - value) <= mp.mpf(10) ** -30 * abs(value), (a, b, x)
    return value


def igamma(a, x, upper):
    """P(a, x) or Q(a, x) at 50 digits."""
    a, x = mp.mpf(a), mp.mpf(x)
    front = mp.exp(a * mp.log(x) - x - mp.loggamma(a))
    if x < a + 1:
        term = s = 1 / a
        n = 0
        while abs(term) > abs(s) * EPS:
            n += 1
            term *= x / (a + n)
            s += term
        p = front * s
        value = 1 - p if upper else p
    else:
        b = x + 1 - a
        c, d = 1 / TINY, 1 / b
        h = d
        i = 0
        while True:
            i += 1
            an = -i * (i - a)
            b += 2
            d = an * d + b
            d = d if abs(d) > TINY else TINY
            c = b + an / c
            c = c if abs(c) > TINY else TINY
            d = 1 / d
            h *= d * c
            if abs(d * c - 1) < EPS:
                break
        q = front * h
        value = q if upper else 1 - q
    if a <= 1000:
        check = mp.gammainc(a, x, mp.inf, regularized=True) if upper else mp.gammainc(a, 0, x, regularized=True)
        assert abs(check - value) <= mp.mpf(10) ** -30 * abs(value), (a, x)
    return value


def log_uniform(lo, hi):
    return float(10 ** random.uniform(float(mp.log10(lo)), float(mp.log10(hi))))


def keep(value):
    return mp.mpf(10) ** -300 < value


def num(v):
    return float(mp.nstr(v, 20))


random.seed(20261202)
out = {'normalUpper': [], 'normalLogCdf': [], 'studentUpper': [], 'chiSquareUpper': [], 'chiSquareCdf': [], 'fisherUpper': [], 'fisherCdf': [], 'beta': []}

while len(out['normalUpper']) < 120:
    z = random.uniform(-38, 38)
    q = mp.ncdf(-mp.mpf(z))
    cond = abs(z) * mp.npdf(z) / q
    if keep(q):
        out['normalUpper'].append([z, num(q), num(cond)])
while len(out['normalLogCdf']) < 120:
    z = -log_uniform(1, 1e4) if random.random() < 0.6 else random.uniform(-1, 38)
    Z = mp.mpf(z)
    value = mp.log(mp.ncdf(Z)) if z < 0 else mp.log1p(-mp.ncdf(-Z))
    cond = abs(Z * mp.npdf(Z) / mp.ncdf(Z) / value)
    out['normalLogCdf'].append([z, num(value), num(cond)])
while len(out['studentUpper']) < 150:
    nu = random.choice([round(log_uniform(1, 1e6)), log_uniform(1, 1e6), random.choice([1, 2, 3, 10, 999, 10**6])])
    t = log_uniform(1e-6, 1e6) * random.choice([-1, 1])
    T, N = mp.mpf(t), mp.mpf(nu)
    two = ibeta(N / 2, mp.mpf(0.5), N / (N + T * T))
    p = two / 2 if t > 0 else 1 - two / 2
    density = mp.exp(mp.loggamma((N + 1) / 2) - mp.loggamma(N / 2) - mp.log(mp.sqrt(N * mp.pi)) - (N + 1) / 2 * mp.log1p(T * T / N))
    if keep(p):
        out['studentUpper'].append([t, nu, num(p), num(abs(T) * density / p)])
while len(out['chiSquareUpper']) < 150:
    k = random.choice([round(log_uniform(1, 1e6)), log_uniform(1, 1e6), random.choice([1, 2, 3, 30, 1000, 10**6])])
    q = k * log_uniform(1e-3, 30) if random.random() < 0.4 else max(1e-6, k + random.uniform(-12, 40) * (2 * k) ** 0.5)
    upper, lower = igamma(mp.mpf(k) / 2, mp.mpf(q) / 2, True), igamma(mp.mpf(k) / 2, mp.mpf(q) / 2, False)
    density = mp.exp((mp.mpf(k) / 2 - 1) * mp.log(mp.mpf(q) / 2) - mp.mpf(q) / 2 - mp.loggamma(mp.mpf(k) / 2)) / 2
    if keep(upper):
        out['chiSquareUpper'].append([q, k, num(upper), num(q * density / upper)])
    if keep(lower):
        out['chiSquareCdf'].append([q, k, num(lower), num(q * density / lower)])
while len(out['fisherUpper']) < 150:
    d1 = random.choice([round(log_uniform(1, 1e6)), log_uniform(1, 1e6), random.choice([1, 2, 5, 1000, 10**6])])
    d2 = random.choice([round(log_uniform(1, 1e6)), log_uniform(1, 1e6), random.choice([1, 2, 5, 1000, 10**6])])
    f = log_uniform(1e-6, 1e6) if random.random() < 0.4 else float(mp.exp(random.uniform(-10, 10) * mp.sqrt(2 / mp.mpf(d1) + 2 / mp.mpf(d2))))
    D1, D2, F = mp.mpf(d1), mp.mpf(d2), mp.mpf(f)
    x = D2 / (D2 + D1 * F)
    upper = ibeta(D2 / 2, D1 / 2, x)
    lower = ibeta(D1 / 2, D2 / 2, 1 - x)
    # f * density of F at f = x^(d2/2) (1 - x)^(d1/2) / B(d1/2, d2/2).
    fdensity = mp.exp(D2 / 2 * mp.log(x) + D1 / 2 * mp.log(1 - x) - log_beta(D1 / 2, D2 / 2))
    if keep(upper):
        out['fisherUpper'].append([f, d1, d2, num(upper), num(fdensity / upper)])
    if keep(lower):
        out['fisherCdf'].append([f, d1, d2, num(lower), num(fdensity / lower)])
while len(out['beta']) < 150:
    a, b = log_uniform(0.5, 1e6), log_uniform(0.5, 1e6)
    if random.random() < 0.5:
        x = random.random()
    else:
        s = a + b
        x = min(0.999999, max(1e-9, a / s + random.uniform(-12, 12) * (a * b / (s * s * (s + 1))) ** 0.5))
    A, B, X = mp.mpf(a), mp.mpf(b), mp.mpf(x)
    lower = ibeta(A, B, X)
    upper = ibeta(B, A, 1 - X)
    xdensity = mp.exp(A * mp.log(X) + B * mp.log(1 - X) - log_beta(A, B))  # x * density / (1 - x) folded below
    if keep(lower) and keep(upper):
        out['beta'].append([x, a, b, num(lower), num(upper), num(xdensity / (1 - X) / min(lower, upper))])

print(json.dumps(out, separators=(',', ':')).replace('],[', '],\n['))
