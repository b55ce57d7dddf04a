"""Independent high-precision derivation of the "derived" check values used by the physics tests.

Run with:  python3 shared/physics/reference/derive-check-values.py   (needs mpmath)

Everything here is re-derived from the published formulas in shared/design/physics.md with
mpmath (30 significant digits, its own root finders and quadrature), without using any
TypeScript code, so a test that compares the TypeScript result with these numbers compares two
independent implementations of the same published theory.
"""
from mpmath import mp, mpf, sqrt, log, exp, pi, quad, findroot, diff

mp.dps = 30
PCP = pi / sqrt(18)


def bisect(f, a, b, n=200):
    fa = f(a)
    for _ in range(n):
        m = (a + b) / 2
        fm = f(m)
        if (fm > 0) == (fa > 0):
            a, fa = m, fm
        else:
            b = m
    return (a + b) / 2


# --- Carnahan-Starling fluid and cell-model solid ------------------------------------------
def Z(p): return (1 + p + p**2 - p**3) / (1 - p)**3
def muex(p): return (8*p - 9*p**2 + 3*p**3) / (1 - p)**3
def pf_hs(p): return p * Z(p)
def mf_hs(p): return log(p) + muex(p)
def ps_hs(p): return 3*p / (1 - p/PCP)
def ms_hs(p): return mpf('2.1306') + 3*log(p / (1 - p/PCP)) + 3/(1 - p/PCP)


def hard_sphere_coexistence():
    r = findroot([lambda a, b: pf_hs(a) - ps_hs(b), lambda a, b: mf_hs(a) - ms_hs(b)], (mpf('0.49'), mpf('0.54')))
    return r[0], r[1], 6 / pi * pf_hs(r[0])


# --- Mean field CS + B2 -----------------------------------------------------------------------
def mf_binodal(b2):
    A = 4 * (1 - mpf(b2))
    p = lambda x: pf_hs(x) - A*x*x
    m = lambda x: mf_hs(x) - 2*A*x
    dp = lambda x: diff(p, x)
    s1 = bisect(dp, mpf('1e-9'), mpf('0.1304'))
    s2 = bisect(dp, mpf('0.1305'), mpf('0.99'))
    # liquid at the gas pressure, gas at the chemical potential: solve in mu
    def gas_at(mu): return bisect(lambda x: m(x) - mu, mpf('1e-40'), s1)
    def liq_at(mu): return bisect(lambda x: m(x) - mu, s2, mpf('0.99'))
    mu = bisect(lambda mu: p(liq_at(mu)) - p(gas_at(mu)), m(s2) + mpf('1e-20'), m(s1) - mpf('1e-20'), 120)
    return gas_at(mu), liq_at(mu), s1, s2


def mf_critical():
    As = lambda x: diff(pf_hs, x) / (2*x)
    pc = findroot(lambda x: diff(As, x), mpf('0.13'))
    return pc, 1 - As(pc)/4


# --- Baxter PY -----------------------------------------------------------------------------------
def py_lambda(p, t):
    a = p/12; b = -(t + p/(1-p)); c = (1 + p/2)/(1-p)**2
    return 2*c / (-b + sqrt(b*b - 4*a*c))


def py_pressure(p, t):
    l = py_lambda(p, t)
    return p * ((1+p+p*p)/(1-p)**3 - l*p*(1+p/2)/(1-p)**2 + l**3*p*p/36)


def py_mu_by_quadrature(p, t):
    """beta mu on the dilute side, integrating the compressibility directly (no closed form)."""
    inv = lambda x: ((1+2*x) - py_lambda(x, t)*x*(1-x))**2/(1-x)**4
    return log(p) + quad(lambda x: (inv(x) - 1)/x, [0, p])


def py_mu_closed(p, t):
    """beta mu from the closed-form adhesive integral (Euler substitution, derived with sympy)."""
    N = (t + p*(1 - t))**2 - p/3 - p**2/6
    s = sqrt(N); b0 = 2*t*(1 - t) - mpf(1)/3; b1 = mpf(4)/3 - 2*t; S2 = sqrt(2)
    R0 = -24*t**3 + 3*(16*t**3 + 18*t - 5)*p - 6*(4*t**3 + 9*t - 3)*p**2
    R1 = 24*t**2 - 2*(24*t**2 + 30*t - 5)*p + 4*(6*t**2 + 15*t - 4)*p**2
    al = 12*t*(6*t - 1); be = S2*(54*t**2 - 12*t + 1)
    A = 1 + b1*(p - 1); B = S2*s
    L = be*log(abs((A - B)/(p - 1))) if t < mpf(1)/3 else -be*log(abs((A + B)/(p - 1)))
    K = (R0 + s*R1)/(p*(1 - p)**2) + al*log(abs(2*t*s + 2*t*t + b0*p)) + L - al*log(1 - p)
    L0 = be*log(abs((2 - S2)*t - mpf(1)/3)) if t < mpf(1)/3 else -be*log(abs((2 + S2)*t - mpf(1)/3))
    K0 = 3*(16*t**3 + 18*t - 5) + t*(-2*(24*t**2 + 30*t - 5)) + 12*t*b0 + al*log(4*t*t) + L0
    hs = -log(1 - p) + 3*p*(2 - p)/(2*(1 - p)**2)
    return log(p) + hs + K - K0 + py_pressure(p, t)/p - 1


def py_binodal(t):
    a = (1 - t)**2 - mpf(1)/6; b = 2*t*(1 - t) - mpf(1)/3; c = t*t
    d = sqrt(b*b - 4*a*c)
    low, high = sorted([(-b - d)/(2*a), (-b + d)/(2*a)])
    def gas_at(mu): return bisect(lambda x: py_mu_closed(x, t) - mu, mpf('1e-30'), low*(1 - mpf('1e-25')))
    def liq_at(mu): return bisect(lambda x: py_mu_closed(x, t) - mu, high*(1 + mpf('1e-25')), mpf('0.9'))
    lo_mu = py_mu_closed(high*(1 + mpf('1e-25')), t); hi_mu = py_mu_closed(low*(1 - mpf('1e-25')), t)
    mu = bisect(lambda m: py_pressure(liq_at(m), t) - py_pressure(gas_at(m), t), lo_mu, hi_mu, 100)
    return gas_at(mu), liq_at(mu)


# --- Free-volume theory -------------------------------------------------------------------------
def alpha(p, q):
    y = p/(1-p); A = 3*q + 3*q**2 + q**3; B = mpf(9)/2*q**2 + 3*q**3; C = 3*q**3
    return (1-p) * exp(-A*y - B*y**2 - C*y**3)


def fvt(q, r):
    da = lambda x: diff(lambda z: alpha(z, q), x)
    pf = lambda x: pf_hs(x) + r/q**3*(alpha(x, q) - x*da(x))
    mf = lambda x: mf_hs(x) - r/q**3*da(x)
    ps = lambda x: ps_hs(x) + r/q**3*(alpha(x, q) - x*da(x))
    ms = lambda x: ms_hs(x) - r/q**3*da(x)
    return pf, mf, ps, ms


def fvt_critical(q, guess):
    def eqs(p, r):
        pf = fvt(q, r)[0]
        return [diff(pf, p), diff(pf, p, 2)]
    c = findroot(lambda p, r: eqs(p, r), guess)
    return c[0], c[1]


def main():
    print('hard spheres (freezing, melting, beta P sigma^3):', *hard_sphere_coexistence())
    print('CS Z at 0.3 0.4 0.45 0.49:', *[Z(mpf(x)) for x in ('0.3', '0.4', '0.45', '0.49')])
    print('mean-field critical (phi, B2*):', *mf_critical())
    for b2 in ('-2', '-3', '-5'):
        print(f'mean-field binodal/spinodal at B2*={b2}:', *mf_binodal(b2))
    print('square well lambda=1.5 B2* at kT/eps=1.2172:', 1 - (mpf('1.5')**3 - 1)*(exp(1/mpf('1.2172')) - 1))
    for p, t in (('0.1', '0.2'), ('0.3', '0.5')):
        p, t = mpf(p), mpf(t)
        l = py_lambda(p, t)
        print(f'PY lambda and inverse compressibility at ({p}, {t}):', l, ((1+2*p) - l*p*(1-p))**2/(1-p)**4)
    print('PY pressure at (0.3, 0.5):', py_pressure(mpf('0.3'), mpf('0.5')))
    print('PY closed-form beta mu equals quadrature at (0.3, 0.5):', py_mu_closed(mpf('0.3'), mpf('0.5')) - py_mu_by_quadrature(mpf('0.3'), mpf('0.5')))
    print('PY binodal at tau = 0.09:', *py_binodal(mpf('0.09')))
    print('PY beta mu at (0.05, 0.5) and (0.3, 0.5) by quadrature:', py_mu_by_quadrature(mpf('0.05'), mpf('0.5')), py_mu_by_quadrature(mpf('0.3'), mpf('0.5')))
    print('AO B2* (q, phi_p^R) = (0.1, 0.25), (0.5, 0.3):',
          *[1 - 3*quad(lambda x: (exp(r*((1+q)/q)**3*(1 - 3*x/(2*(1+q)) + x**3/(2*(1+q)**3))) - 1)*x*x, [1, 1+q])
            for q, r in ((mpf('0.1'), mpf('0.25')), (mpf('0.5'), mpf('0.3')))])
    for q, g in ((mpf('0.1'), (mpf('0.6'), mpf('0.26'))), (mpf('1'), (mpf('0.104'), mpf('0.636')))):
        print(f'FVT critical point q={q}:', *fvt_critical(q, g))
    q, r = mpf('0.5'), mpf('1.0')
    pf, mf, ps, ms = fvt(q, r)
    b = findroot([lambda a, l: pf(a) - pf(l), lambda a, l: mf(a) - mf(l)], (mpf('0.0004'), mpf('0.51')))
    print('FVT gas-liquid q=0.5 phi_p^R=1:', b[0].real, b[1].real)
    for q, r, g in ((mpf('0.5'), mpf('0.2'), (mpf('0.49'), mpf('0.544'))), (mpf('0.1'), mpf('0.1'), (mpf('0.47'), mpf('0.59')))):
        pf, mf, ps, ms = fvt(q, r)
        s = findroot([lambda a, l: pf(a) - ps(l), lambda a, l: mf(a) - ms(l)], g)
        print(f'FVT fluid-solid q={q} phi_p^R={r}:', s[0].real, s[1].real)

    def margin(q):
        p, r = fvt_critical(q, (mpf('0.32'), mpf('0.378')))
        pf, mf, ps, ms = fvt(q, r.real)
        mu = mf(p.real).real
        psol = bisect(lambda x: (ms(x) - mu).real, mpf('0.55'), PCP*(1 - mpf('1e-12')))
        return (ps(psol) - pf(p.real)).real
    print('FVT critical endpoint q:', bisect(margin, mpf('0.32'), mpf('0.335'), 60))
    kT = mpf('1.380649e-23') * mpf('298.15')
    print('Stokes-Einstein D (a=100 nm, 0.89002 mPa s, 25 C):', kT/(6*pi*mpf('0.89002e-3')*mpf('1e-7')))
    eps0 = mpf('8.8541878128e-12'); e = mpf('1.602176634e-19'); NA = mpf('6.02214076e23')
    print('Debye length nm at I=1 M, 25 C, eps_r=78.4:', sqrt(mpf('78.4')*eps0*kT/(2*NA*e*e*1000))*1e9)
    rg = mpf('0.0215') * mpf(20000)**mpf('0.583')
    print('PEG 20 kg/mol R_g nm, c* g/L:', rg, 3*20000/(4*pi*NA*(rg*mpf('1e-9'))**3)/1000)


def dlvo_check():
    """DLVO B2* for a = 100 nm, A_H = 1e-20 J, psi0 = -25 mV, 0.1 M 1:1 salt, 25 C, h_min = 0.4 nm."""
    kT = mpf('1.380649e-23') * mpf('298.15')
    eps = mpf('78.4') * mpf('8.8541878128e-12')
    kappa = 1 / (sqrt(eps*kT/(2*mpf('6.02214076e23')*mpf('1.602176634e-19')**2*100)))
    a = mpf('100e-9'); A = mpf('1e-20'); psi = mpf('-0.025'); hmin = mpf('0.4e-9'); sigma = 2*a

    def beta_u(h):
        r = 2*a + h
        vdw = -(A/6)*(2*a*a/(r*r - 4*a*a) + 2*a*a/(r*r) + log((r*r - 4*a*a)/(r*r)))
        dl = 2*pi*eps*a*psi**2*log(1 + exp(-kappa*h))
        return (vdw + dl)/kT
    x0 = 1 + hmin/sigma
    # Up to x = 60: the van der Waals tail (~ r^-6) still adds ~5e-6 relative beyond x = 3.
    tail = quad(lambda x: (exp(-beta_u((x - 1)*sigma)) - 1)*x*x, [x0, x0 + mpf('1e-5'), x0 + mpf('1e-4'), x0 + mpf('1e-3'), x0 + mpf('1e-2'), mpf('1.5'), mpf('3'), mpf('10'), mpf('60')])
    return beta_u(hmin), 1 + (x0**3 - 1) - 3*tail, 1/kappa


def depletion_recipe_limits():
    """Contact attraction of depletion recipes near the 600 kT limit (a = 30 nm, R_g = 17.7 nm,
    M = 100 kg/mol): U = phi_p^R (1 + 3/(2q)), phi_p^R = c_s/(c* alpha(phi)), and the phi or c
    where U reaches 600 kT."""
    NA = mpf('6.02214076e23'); q = mpf('17.7')/30
    cstar = 3*mpf(100000)/(4*pi*NA*(mpf('17.7e-9'))**3)/1000
    contact = lambda p, c, solvent: c*((1 - p) if solvent else 1)/cstar/alpha(p, q)*(1 + 3/(2*q))
    phi_max = bisect(lambda p: contact(p, 1, True) - 600, mpf('0.3'), mpf('0.55'))
    c_max = 600/contact(mpf('0.3'), 1, False)
    return cstar, contact(mpf('0.55'), 1, True), phi_max, contact(mpf('0.3'), 5000, False), c_max


def fvt_dilute_gas_crystal(q, r, guess):
    """Gas-crystal coexistence with an extremely dilute gas, solved in ln(phi_gas)."""
    pf, mf, ps, ms = fvt(q, r)
    sol = findroot(lambda L, s: [pf(exp(L)) - ps(s), mf(exp(L)) - ms(s)], guess)
    return exp(sol[0]), sol[1]


if __name__ == '__main__':
    print('FVT gas-crystal q = 0.4, phi_p^R = 20:', *fvt_dilute_gas_crystal(mpf('0.4'), mpf(20), (mpf(-416.4), mpf('0.73525'))))
    print('FVT critical point q = 0.05, 0.01:', *fvt_critical(mpf('0.05'), (mpf('0.739'), mpf('0.2214'))), *fvt_critical(mpf('0.01'), (mpf('0.9127'), mpf('0.18057'))))
    tc = (2 - sqrt(2))/6
    print('PY beta mu near hard spheres (0.3, 1e4), (0.5, 1e5):', py_mu_by_quadrature(mpf('0.3'), mpf('1e4')), py_mu_by_quadrature(mpf('0.5'), mpf('1e5')))
    print('PY beta mu at tau_c: (0.05) quadrature, (0.3) closed form just above:', py_mu_by_quadrature(mpf('0.05'), tc), py_mu_closed(mpf('0.3'), tc*(1 + mpf('1e-20'))))
    print('Depletion recipe limits (c* g/L, U at phi 0.55 1 g/L solvent, phi_max, U at phi 0.3 5000 g/L sample, c_max g/L):', *depletion_recipe_limits())
    print('DLVO (contact beta U, B2*, Debye length m):', *dlvo_check())
    main()
