"""Benchmarks: each a ratio against a baseline measured side by side in the same run.

Run ``python benchmarks/run.py``; it prints a Markdown table, writes it to
``benchmarks/results.md`` and draws ``benchmarks/scaling.png`` (time against
problem size from 10 to 10^7, and the cost per state of the names-in chain and two
numbers-in calls at each decade from 10^4 states up to ``MASSTRANSFER_BENCH_MAX_STATES``,
default 10^8, against its value at 10^6; the names-in call on 10^8 states needs about 13 GB
of memory for its inputs and its thirteen output arrays).  Times are the best of several repeats (shared,
noisy machines); the ratios, not the absolute times, are the result.
"""

from __future__ import annotations

import datetime
import os
import platform
import subprocess
import sys
import textwrap
import timeit
from pathlib import Path

import numpy as np

import masstransfer as mt
from masstransfer.diffusivity import fuller_volume


def best(stmt, number: int, repeat: int = 7) -> float:
    """Best time per call [s] of ``stmt`` over ``repeat`` batches of ``number`` calls."""
    return min(timeit.repeat(stmt, number=number, repeat=repeat)) / number


def bench_array_fuller() -> tuple[str, float, float, str]:
    T = np.linspace(250.0, 1200.0, 1_000_000)
    P = 101325.0
    a, b = mt.species("toluene"), mt.species("air")
    va, vb = fuller_volume(a), fuller_volume(b)
    Ma, Mb = a.molar_mass * 1000, b.molar_mass * 1000

    def bare():
        M_ab = 2.0 / (1.0 / Ma + 1.0 / Mb)
        return 0.00143e-4 * T**1.75 / ((P / 1e5) * M_ab**0.5 * (va ** (1 / 3) + vb ** (1 / 3)) ** 2)

    def ours():
        return mt.gas_diffusivity("toluene", "air", T, P)

    np.testing.assert_allclose(ours(), bare(), rtol=1e-12)
    t_base, t_ours = best(bare, 3), best(ours, 3)
    return ("gas_diffusivity, named species, 10^6 temperatures", t_ours, t_base, "bare numpy Fuller")


def bench_scalar_vs_cantera(method: str) -> tuple[str, float, float, str]:
    """One cached scalar call against Cantera setting a state and reading one D_ij."""
    import cantera as ct

    gas = ct.Solution("gri30.yaml")
    gas.TPX = 300.0, ct.one_atm, "N2:1"
    i, j = gas.species_index("CO2"), gas.species_index("N2")

    def cantera_call():
        gas.TP = 300.0, ct.one_atm
        return gas.binary_diff_coeffs[i, j]

    def ours():
        return mt.gas_diffusivity("carbon dioxide", "nitrogen", 300.0, 101325.0, method=method)

    ours()
    t_base, t_ours = best(cantera_call, 2000), best(ours, 20000)
    return (
        f"one scalar gas_diffusivity call, {method} (cached species)",
        t_ours,
        t_base,
        "Cantera set state + read D_ij",
    )


def bench_scalar_vs_bare() -> tuple[str, float, float, str]:
    """One cached scalar Fuller call against the bare Fuller expression with its constant."""
    c, T, P = 7.0e-10, 300.0, 101325.0  # the constant's value does not change the cost

    def bare():
        return c * T**1.75 / P

    def ours():
        return mt.gas_diffusivity("carbon dioxide", "nitrogen", 300.0, 101325.0)

    ours()
    t_base, t_ours = best(bare, 20000), best(ours, 20000)
    return (
        "one scalar gas_diffusivity call, default method (cached species)",
        t_ours,
        t_base,
        "bare Fuller expression, constant precomputed",
    )


def bench_liquid_viscosity() -> tuple[str, float, float, str]:
    from thermo import ViscosityLiquid

    w = mt.liquid_model("water")
    sp = w.species
    ref = ViscosityLiquid(CASRN=sp.CAS, MW=sp.molar_mass * 1000, Tm=sp.Tm, Tc=sp.Tc, Pc=sp.Pc)
    T = np.linspace(280.0, 360.0, 100_000)
    T_small = T[::100]

    def per_state():
        return [ref.T_dependent_property(t) for t in T_small]

    def ours():
        return w.viscosity(T)

    t_base = best(per_state, 3) / T_small.size
    t_ours = best(ours, 3) / T.size
    return (
        "liquid viscosity per state, 10^5-state array",
        t_ours,
        t_base,
        "thermo model, one call per state",
    )


def _bench_record(slug: str, bare_expr, inputs: dict) -> tuple[str, float, float, str]:
    from masstransfer import surface

    rec = surface.correlation(slug)

    def ours():
        return rec.nusselt(**inputs)

    np.testing.assert_allclose(ours(), bare_expr(), rtol=1e-12)
    t_base, t_ours = best(bare_expr, 5), best(ours, 5)
    return (f"correlation {slug}, 10^6 points", t_ours, t_base, "bare numpy expression")


def bench_records() -> list[tuple[str, float, float, str]]:
    Re = np.linspace(1.0, 200.0, 1_000_000)
    Pr = 0.7
    Ra = np.geomspace(1e4, 1e11, 1_000_000)
    rows = [
        _bench_record(
            "sphere-ranz-marshall", lambda: 2.0 + 0.6 * Re**0.5 * Pr ** (1 / 3), {"Re": Re, "Pr": Pr}
        ),
        _bench_record(
            "cylinder-churchill-bernstein",
            lambda: (
                0.3
                + (0.62 * Re**0.5 * Pr ** (1 / 3) / (1 + (0.4 / Pr) ** (2 / 3)) ** 0.25)
                * (1 + (Re / 282000.0) ** 0.625) ** 0.8
            ),
            {"Re": Re, "Pr": Pr},
        ),
        _bench_record(
            "vertical-plate-churchill-chu",
            lambda: (0.825 + 0.387 * Ra ** (1 / 6) / (1 + (0.492 / Pr) ** (9 / 16)) ** (8 / 27)) ** 2,
            {"Ra": Ra, "Pr": Pr},
        ),
    ]
    from masstransfer import surface

    rec = surface.correlation("sphere-ranz-marshall")
    import math

    def bare_scalar():
        return 2.0 + 0.6 * math.sqrt(100.0) * 0.7 ** (1 / 3)

    def ours_scalar():
        return rec.nusselt(Re=100.0, Pr=0.7)

    rows.append(
        (
            "one scalar record call (sphere-ranz-marshall)",
            best(ours_scalar, 20000),
            best(bare_scalar, 20000),
            "bare math expression",
        )
    )
    return rows


def bench_analogy_numeric() -> tuple[str, float, float, str]:
    h = np.linspace(5.0, 200.0, 1_000_000)
    rho, cp, Pr, Sc = 1.16, 1007.0, 0.707, 0.61

    def bare():
        return h / (rho * cp) * (Pr / Sc) ** (2 / 3)

    def ours():
        return mt.surface.mass_transfer_coefficient_from_heat(h, rho=rho, cp=cp, Pr=Pr, Sc=Sc)

    np.testing.assert_allclose(ours(), bare(), rtol=1e-14)
    t_base, t_ours = best(bare, 5), best(ours, 5)
    return ("mass_transfer_coefficient_from_heat, 10^6 values", t_ours, t_base, "bare numpy expression")


def bench_analogy_resolved() -> tuple[str, float, float, str]:
    from thermo import Chemical

    T = np.linspace(300.0, 400.0, 100_000)
    h = np.full_like(T, 30.0)

    def ours():
        return mt.mass_transfer_from_heat(h, "water", "air", T)

    ours()
    T_few = T[:: T.size // 10][:10]

    def per_state():
        out = []
        for t in T_few:
            air = Chemical("nitrogen", T=float(t), P=101325.0)  # one property object per state
            out.append(30.0 / (air.rho * air.Cp))
        return out

    t_ours = best(ours, 3, repeat=3) / T.size
    t_base = best(per_state, 1, repeat=3) / T_few.size
    return (
        "mass_transfer_from_heat per state, 10^5 states",
        t_ours,
        t_base,
        "thermo Chemical built per state",
    )


def bench_uptake() -> tuple[str, float, float, str]:
    from masstransfer import bodies

    t = np.geomspace(1.0, 1e6, 1_000_000)
    D, a = 1e-11, 1e-3
    T = t * D / a**2

    def bare_50_terms():
        n = np.arange(50)[:, None]
        m = 2 * n + 1.0
        return 1 - np.sum(8 / (m**2 * np.pi**2) * np.exp(-(m**2) * np.pi**2 * T / 4), axis=0)

    def ours():
        return bodies.fractional_uptake("slab", t, D, a)

    sel = T > 0.05  # where 50 terms have converged, the two agree
    np.testing.assert_allclose(np.asarray(ours())[sel], bare_50_terms()[sel], atol=1e-10)
    t_base, t_ours = best(bare_50_terms, 1, repeat=3), best(ours, 1, repeat=3)
    return ("fractional_uptake slab, 10^6 times", t_ours, t_base, "bare numpy, first 50 series terms")


def bench_contactors() -> list[tuple[str, float, float, str]]:
    """Packed-column and reaction calls on 10^6 operating points against the bare expressions."""
    from masstransfer import contactors

    uV = np.linspace(0.3, 2.0, 1_000_000)
    uL, a, eps, CV, Ch, rV, muV, DV, rL, muL, T = (
        0.005,
        112.6,
        0.951,
        0.41,
        0.784,
        1.2,
        1.8e-5,
        1.6e-5,
        998.0,
        1e-3,
        298.15,
    )
    g, R = 9.80665, 8.31446261815324

    def bare_kG():
        ReL, FrL = uL * rL / (a * muL), uL**2 * a / g
        ah = np.where(ReL < 5, Ch * ReL**0.15 * FrL**0.1, 0.85 * Ch * ReL**0.25 * FrL**0.1)
        hL = np.cbrt(12 * muL * a * a * uL / (g * rL)) * ah ** (2 / 3)
        dh = 4 * eps / a
        kc = CV / np.sqrt(eps - hL) * np.sqrt(a / dh) * DV * (uV * rV / (a * muV)) ** 0.75
        return kc * np.cbrt(muV / (rV * DV)) / (R * T)

    def ours_kG():
        return contactors.billet_schultes_k_G(uV, uL, a, eps, CV, Ch, rV, muV, DV, rL, muL, T)

    np.testing.assert_allclose(ours_kG(), bare_kG(), rtol=1e-12)
    Ha = np.geomspace(0.01, 1e3, 1_000_000)
    Ei = 50.0

    def bare_E():
        return -(Ha**2) / (2 * (Ei - 1)) + np.sqrt(Ha**4 / (4 * (Ei - 1) ** 2) + Ei * Ha**2 / (Ei - 1) + 1)

    def ours_E():
        return contactors.enhancement_factor(Ha, Ei)

    np.testing.assert_allclose(ours_E(), bare_E(), rtol=1e-9)
    A = np.linspace(0.6, 5.0, 1_000_000)

    def bare_N():
        r = 1 - 1 / A
        return np.log(r * ((0.02 - 0.0) / (0.01 - 0.0) - 1) + 1) / r

    def ours_N():
        return contactors.transfer_units(0.02, 0.01, 0.0, 1.2, A)

    with np.errstate(divide="ignore", invalid="ignore"):
        ref = bare_N()
    sel = np.abs(1 - 1 / A) > 1e-3  # away from A = 1, where the bare form divides by ~0
    np.testing.assert_allclose(np.asarray(ours_N())[sel], ref[sel], rtol=1e-12)
    rows = []
    for name, ours, bare, base in (
        ("billet_schultes_k_G, 10^6 gas velocities", ours_kG, bare_kG, "bare numpy expression"),
        ("enhancement_factor (DeCoursey), 10^6 Hatta numbers", ours_E, bare_E, "bare numpy expression"),
        ("transfer_units (Colburn), 10^6 absorption factors", ours_N, bare_N, "bare numpy, no A = 1 branch"),
    ):
        with np.errstate(divide="ignore", invalid="ignore"):
            rows.append((name, best(ours, 3), best(bare, 3), base))
    return rows


def bench_evaporation(n: int = 10_000) -> list[tuple[str, float, float, str]]:
    """One-call evaporation over ``n`` gas states against the same balance in bare numpy, twice.

    Both baselines solve the wet-surface energy balance by 48 bisection halvings with the
    stagnant-gas flux.  The first freezes every property as a constant and takes an Antoine
    vapour pressure: the arithmetic alone, a flattering baseline, since it leaves out every
    property evaluation.  The second calls the library's own property curves (vapour pressure
    and latent heat at every halving, the gas properties and diffusivity at the film
    temperature, two passes): the same arithmetic with the same properties, without the
    library's checks, warnings, range guards and result record.
    """
    from masstransfer import humidity
    from masstransfer.humidity._state import make_pair

    T = np.linspace(320.0, 380.0, n)
    P, h, y = 101325.0, 30.0, 0.02
    rho, cp, M, lam, R = 1.06, 1007.0, 0.018015, 2.4e6, 8.314462618
    k_c = h / (rho * cp) * (0.71 / 0.6) ** (2 / 3)  # frozen Pr and Sc (constants for the baseline)

    def psat(t):
        return 133.322 * 10 ** (8.07131 - 1730.63 / (t - 39.724))  # Antoine, water (constants fixed)

    def bare():
        lo, hi = np.full_like(T, 274.0), T.copy()
        F = k_c * P / (R * T)
        for _ in range(48):
            mid = 0.5 * (lo + hi)
            N = F * np.log((1 - y) / (1 - psat(mid) / P))
            up = h * (T - mid) - N * M * lam > 0
            lo, hi = np.where(up, mid, lo), np.where(up, hi, mid)
        Ts = 0.5 * (lo + hi)
        return F * np.log((1 - y) / (1 - psat(Ts) / P)) * M

    pair = make_pair("water", "air")
    liq, gas = pair.liq, pair.gas

    def with_curves():
        Ts = T
        for _ in range(2):  # film properties at the bulk, then at the film temperature
            Tf = 0.5 * (T + Ts)
            rho_f, cp_f = gas.density(Tf, P), gas.heat_capacity(Tf)
            Le = gas.thermal_conductivity(Tf) / (rho_f * cp_f * gas.diffusivity(Tf, P))
            F = h / (rho_f * cp_f * Le ** (2 / 3)) * P / (R * Tf)
            lo, hi = np.full_like(T, 274.0), T.copy()
            for _ in range(48):
                mid = 0.5 * (lo + hi)
                N = F * np.log((1 - y) / (1 - liq.vapour_pressure(mid) / P))
                up = h * (T - mid) - N * M * liq.latent_heat(mid) > 0
                lo, hi = np.where(up, mid, lo), np.where(up, hi, mid)
            Ts = 0.5 * (lo + hi)
        return F * np.log((1 - y) / (1 - liq.vapour_pressure(Ts) / P)) * M

    def ours():
        return humidity.evaporation_rate("water", "air", T=T, h=h, P=P, y=y).mass_flux

    # same physics, frozen versus temperature-dependent properties: a few per cent apart
    np.testing.assert_allclose(ours(), bare(), rtol=0.15)
    # same curves; the library adds the Ackermann correction (up to 3 % at these fluxes)
    np.testing.assert_allclose(ours(), with_curves(), rtol=0.03)
    t_ours, t_base, t_curves = float("inf"), float("inf"), float("inf")
    for _ in range(5):  # in alternation, so that load on a shared machine falls on all three
        t_ours = min(t_ours, best(ours, 1, repeat=1))
        t_base = min(t_base, best(bare, 1, repeat=1))
        t_curves = min(t_curves, best(with_curves, 1, repeat=1))
    label = f"evaporation_rate (water in air), 10^{round(np.log10(n))} states"
    return [
        (label, t_ours, t_base, "same balance, bare numpy, frozen properties (flattering)"),
        (label, t_ours, t_curves, "same balance, bare numpy, the library's property curves"),
    ]


def bench_import() -> tuple[str, float, float, str]:
    code = (
        "import time, sys; t=time.perf_counter(); import {m}; "
        "print(time.perf_counter()-t, 'thermo' in sys.modules or 'chemicals' in sys.modules)"
    )

    def run(mod: str) -> tuple[float, bool]:
        times = []
        loaded = False
        for _ in range(5):
            out = subprocess.run(
                [sys.executable, "-c", code.format(m=mod)], capture_output=True, text=True, check=True
            ).stdout.split()
            times.append(float(out[0]))
            loaded = out[1] == "True"
        return min(times), loaded

    t_ours, loaded = run("masstransfer")
    if loaded:
        raise SystemExit("import masstransfer loaded thermo or chemicals")
    t_base, _ = run("thermo")
    return ("import masstransfer (databases not loaded)", t_ours, t_base, "import thermo")


def _fresh(code: str, env: dict[str, str] | None = None, repeat: int = 3) -> float:
    """Best wall time [s] of ``code`` in a fresh interpreter, imports included, startup excluded."""
    import os

    wrapped = f"import time\n_t = time.perf_counter()\n{code}\nprint(time.perf_counter() - _t)"
    times = []
    for _ in range(repeat):
        out = subprocess.run(
            [sys.executable, "-c", wrapped],
            capture_output=True,
            text=True,
            check=True,
            env={**os.environ, **(env or {})},
        )
        times.append(float(out.stdout.split()[-1]))
    return min(times)


def bench_cold_start() -> list[tuple[str, float, float, str]]:
    """First names-in calls in a fresh process, against a bare ``chemicals`` look-up of the name."""
    import tempfile

    lookup = "from chemicals.identifiers import search_chemical\nsearch_chemical({name!r})"
    rows = []
    cold = {"MASSTRANSFER_NO_CACHE": "1"}
    base = _fresh(lookup.format(name="toluene"))
    ours = _fresh("import masstransfer as mt\nmt.gas_diffusivity('toluene', 'air', 300.0)", cold)
    rows.append(("first gas_diffusivity (toluene in air) in a fresh process", ours, base,
                 "bare chemicals look-up of 'toluene'"))  # fmt: skip
    base = _fresh(lookup.format(name="water"))
    call = "import masstransfer as mt\nmt.mass_transfer_from_heat(30.0, 'water', 'air', 300.0)"
    ours = _fresh(call, cold)
    rows.append(("first mass_transfer_from_heat (water in air), cold curve cache", ours, base,
                 "bare chemicals look-up of 'water'"))  # fmt: skip
    with tempfile.TemporaryDirectory() as where:
        warm = {"MASSTRANSFER_CACHE_DIR": where}
        _fresh(call, warm, repeat=1)  # fills the cache
        ours = _fresh(call, warm)
    rows.append(("first mass_transfer_from_heat (water in air), warm curve cache", ours, base,
                 "bare chemicals look-up of 'water'"))  # fmt: skip
    return rows


def bench_quantity_check() -> list[tuple[str, float, float, str]]:
    """Plain-number calls: the guard's look-out for pint quantities against the same guard without it.

    The baseline wraps the same undecorated function in ``guard(quantities=False)``, the guard as
    it was before units.  The two are timed in alternation (sixty short batches, the median of
    each) so that machine noise falls on both alike.  A last row prices a call that does pass quantities.
    """
    import inspect

    from masstransfer import _validation, diffusivity, surface

    def pair(fn, check_output: bool):
        return fn, _validation.guard(check_output=check_output, quantities=False)(inspect.unwrap(fn))

    T6 = np.linspace(250.0, 1200.0, 100_000)
    cases = [
        ("one scalar reynolds call (3 arguments)", *pair(surface.reynolds, True), (1.0, 0.1, 1.5e-5), {}),
        (
            "one scalar fuller call (6 arguments)",
            *pair(diffusivity.fuller, False),
            (300.0, 1e5, 0.018, 0.029, 13.1, 19.7),
            {},
        ),
        (
            "one scalar mass_transfer_coefficient_from_heat call (5 arguments, 4 by keyword)",
            *pair(surface.mass_transfer_coefficient_from_heat, False),
            (40.0,),
            {"rho": 1.16, "cp": 1007.0, "Pr": 0.707, "Sc": 0.61},
        ),
        (
            "fuller on 10^5 temperatures",
            *pair(diffusivity.fuller, False),
            (T6, 1e5, 0.018, 0.029, 13.1, 19.7),
            {},
        ),
    ]
    rows = []
    for name, ours_fn, base_fn, args, kwargs in cases:
        number = 2000 if np.ndim(args[0]) == 0 else 5

        def ours(ours_fn=ours_fn, args=args, kwargs=kwargs):
            return ours_fn(*args, **kwargs)

        def base(base_fn=base_fn, args=args, kwargs=kwargs):
            return base_fn(*args, **kwargs)

        assert ours() == base() if np.ndim(args[0]) == 0 else np.array_equal(ours(), base())
        ours_t, base_t = [], []
        for _ in range(60):  # short batches in alternation; the medians shrug off load spikes
            ours_t.append(best(ours, number, repeat=1))
            base_t.append(best(base, number, repeat=1))
        t_ours, t_base = float(np.median(ours_t)), float(np.median(base_t))
        rows.append((f"{name}, plain numbers", t_ours, t_base, "same guard without the quantity look-out"))
    try:
        import pint
    except ImportError:
        return rows
    Q = pint.get_application_registry().Quantity
    T = Q(46.85, "degC")

    def plain() -> object:
        return mt.gas_diffusivity("water", "air", 320.0)

    def with_units() -> object:
        return mt.gas_diffusivity("water", "air", T)

    with_units()
    rows.append(
        (
            "one scalar gas_diffusivity call with a pint temperature (degC)",
            best(with_units, 2000),
            best(plain, 20000),
            "same call, plain float",
        )
    )
    return rows


def _names_in(n: int) -> tuple[np.ndarray, np.ndarray]:
    return np.full(n, 30.0), np.linspace(300.0, 400.0, n)


def _series() -> dict[str, object]:
    """The calls whose cost per state is followed: each a function of (h, T, Sc) arrays."""
    from masstransfer import diffusivity, surface

    return {
        "names in: mass_transfer_from_heat (water in air)": lambda h, T, Sc: mt.mass_transfer_from_heat(
            h, "water", "air", T
        ),
        "numbers in: mass_transfer_coefficient_from_heat": lambda h, T, Sc: (
            surface.mass_transfer_coefficient_from_heat(h, rho=1.1, cp=1007.0, Pr=0.71, Sc=Sc)
        ),
        "numbers in: fuller": lambda h, T, Sc: diffusivity.fuller(T, 101325.0, 0.018, 0.029, 13.1, 19.7),
    }


#: Cost per state [s] of the first call at the largest size, per series (see per_state_costs).
FIRST_CALL: dict[str, float] = {}


def per_state_costs(max_states: float) -> dict[str, tuple[list[int], list[float]]]:
    """Cost per state [s] at each decade from 10^4 states up, for the names-in chain and two numbers-in calls.

    Up to 10^7 states every size of a series is timed in alternation with the others, seven
    rounds of batches of about three million states each, and the best batch kept: a load
    spike on the shared machine then falls on all sizes alike.  Larger sizes take the best of
    three calls; the first of them, which faults in memory the process has not used before, is
    kept in :data:`FIRST_CALL`.
    """
    sizes = [10**e for e in range(4, round(np.log10(max_states)) + 1)]
    small = [n for n in sizes if n <= 10**7]
    out: dict[str, tuple[list[int], list[float]]] = {}
    for label, fn in _series().items():
        data = {n: (*_names_in(n), np.linspace(0.6, 0.8, n)) for n in small}
        for n in small:
            fn(*data[n])  # warm up
        costs = dict.fromkeys(sizes, float("inf"))
        for _ in range(7):
            for n in small:
                reps = max(1, int(3e6 // n))
                costs[n] = min(costs[n], best(lambda fn=fn, a=data[n]: fn(*a), reps, repeat=1) / n)
        del data
        for n in sizes[len(small) :]:
            args = (*_names_in(n), np.linspace(0.6, 0.8, n))
            calls = [best(lambda fn=fn, a=args: fn(*a), 1, repeat=1) / n for _ in range(3)]
            costs[n] = min(calls)
            FIRST_CALL[label] = calls[0]
            del args
        out[label] = (sizes, [costs[n] for n in sizes])
        print(label, [f"{c * 1e9:.0f} ns" for c in out[label][1]], flush=True)
    return out


#: glibc's allocator told to keep freed memory for reuse instead of returning it to the kernel
#: (no mmap for large arrays, no trimming of the heap): fresh result arrays then reuse pages
#: already faulted in by earlier calls.
KEPT_MEMORY = {"MALLOC_MMAP_MAX_": "0", "MALLOC_TRIM_THRESHOLD_": str(1 << 40)}


def per_state_costs_in(
    env: dict[str, str], max_states: float
) -> tuple[dict[str, tuple[list[int], list[float]]], dict[str, float]]:
    """:func:`per_state_costs` and :data:`FIRST_CALL`, measured in a fresh process with ``env`` added."""
    import json

    out = subprocess.run(
        [sys.executable, __file__, "decades", repr(max_states)],
        env={**os.environ, **env},
        capture_output=True,
        text=True,
        check=True,
    ).stdout
    data = json.loads(out.strip().splitlines()[-1])
    costs = {label: (sizes, per_state) for label, (sizes, per_state) in data["costs"].items()}
    return costs, data["first"]


#: Where a Linux guest counts the free memory it has handed back to its host (free page reporting).
REPORTED_KIB = Path("/sys/module/page_reporting/parameters/reported_kib")


def _reported_kib() -> int | None:
    """Free memory handed back to the host since boot [KiB], or None where the kernel does not report it."""
    try:
        return int(REPORTED_KIB.read_text().strip())
    except (OSError, ValueError):
        return None


def _settled(pause: float, limit: float = 120.0) -> None:
    """Idle ``pause`` seconds, then on until the kernel stops handing free memory to the host.

    A kernel that reports free pages to its host does so a few hundred MiB at a time; after a
    large free it may take a minute.  Until it has finished, a fresh allocation may still get
    pages the host has not taken back (the kernel hands out the most recently freed first).
    """
    import time

    time.sleep(pause)
    start = time.monotonic()
    last = _reported_kib()
    while last is not None and time.monotonic() - start < limit:
        time.sleep(2.0)
        now = _reported_kib()
        if now is None or now - last < 16 * 1024:
            return
        last = now


def first_touch_cost(n: int = 5 * 10**7, pause: float = 10.0, repeat: int = 3) -> dict[str, float | None]:
    """Cost per float64 value [s] of filling an array: in use, fresh, and fresh after a pause.

    ``again``: an array already in use (best of ``repeat``).  ``fresh``: a new array of ``n``
    values allocated straight after another of the same size was freed (pages the kernel has
    just had back; best of ``repeat``).  ``after_pause``: the mean over ``repeat`` of the same
    after idling ``pause`` seconds and until the kernel has finished handing free memory back
    to its host, where it does; the host must then supply every page again.  ``reported_mib``:
    free memory the kernel handed back to its host during the pauses [MiB] (None where it does
    not report that).
    """
    in_use = np.empty(n)
    in_use.fill(0.0)
    again = best(lambda: in_use.fill(1.0), 1, repeat)
    in_use = np.empty(0)

    def fresh() -> None:
        a = np.empty(n)
        a.fill(1.0)

    fresh()
    straight = best(fresh, 1, repeat)
    paused = []
    before = _reported_kib()
    for _ in range(repeat):
        _settled(pause)
        paused.append(best(fresh, 1, 1))
    after = _reported_kib()
    reported = None if before is None or after is None else (after - before) / 1024
    return {
        "again": again / n,
        "fresh": straight / n,
        "after_pause": float(np.mean(paused)) / n,
        "reported_mib": reported,
    }


def chunked_costs(max_states: float) -> dict[int, float]:
    """Cost per state [s] of k_c over a design grid through :mod:`masstransfer.sweep`, one thread.

    The names-in chain on blocks of 2**20 states (dask's synchronous scheduler, so one core as
    in the direct calls), keeping only k_c: best of three computations at each decade from
    10^6 states up.  Run in a fresh process with the allocator as it comes.
    """
    from masstransfer import sweep

    def k_c(h, T):  # one field of the names-in result, block by block
        return mt.mass_transfer_from_heat(h, "water", "air", T).k_c

    out = {}
    for e in range(6, round(np.log10(max_states)) + 1):
        grid = sweep.design_grid(T=np.linspace(300.0, 400.0, 10**e), h=[30.0])
        lazy = sweep.evaluate(k_c, grid)
        calls = [best(lambda lazy=lazy: lazy.compute(scheduler="synchronous"), 1, 1) for _ in range(3)]
        out[10**e] = min(calls) / 10**e
    return out


def block_size_costs(
    sizes: tuple[int, ...] = (8192, 16000, 32768, 65536), states: tuple[int, ...] = (10**5, 10**6, 10**7)
) -> dict[int, list[float]]:
    """Cost per state [s] of the names-in chain for each block length at each size, alternated."""
    from masstransfer import _blocks

    default = _blocks.BLOCK
    data = {n: _names_in(n) for n in states}
    costs = {b: [float("inf")] * len(states) for b in sizes}
    try:
        for _ in range(5):
            for b in sizes:
                _blocks.BLOCK = b
                for i, n in enumerate(states):
                    h, T = data[n]
                    reps = max(1, int(1e6 // n))
                    t = best(lambda h=h, T=T: mt.mass_transfer_from_heat(h, "water", "air", T), reps, 1)
                    costs[b][i] = min(costs[b][i], t / n)
    finally:
        _blocks.BLOCK = default
    return costs


def peak_memory_ratio(n: int, label: str = "names in: mass_transfer_from_heat (water in air)") -> float:
    """Peak memory of one call on ``n`` states over its inputs and outputs [bytes/bytes], numpy's count."""
    import tracemalloc

    fn = _series()[label]
    args = (*_names_in(n), np.linspace(0.6, 0.8, n))
    fn(*(a[:10] for a in args))
    tracemalloc.start()
    r = fn(*args)
    _, peak = tracemalloc.get_traced_memory()
    tracemalloc.stop()
    fields = [r] if isinstance(r, np.ndarray) else [v for v in vars(r).values() if isinstance(v, np.ndarray)]
    produced = sum(v.nbytes for v in fields if not any(v is a for a in args))
    used = (0, 2) if "mass_transfer_coefficient" in label else (0, 1) if "names" in label else (1,)
    return peak / (sum(args[i].nbytes for i in used) + produced)


def scaling_plot(
    path: Path,
    costs: dict[str, tuple[list[int], list[float]]] | None = None,
    kept: dict[str, tuple[list[int], list[float]]] | None = None,
) -> None:
    """Time per call against size (10 to 10^7), and cost per state from 10^4 up (names in, numbers in)."""
    import matplotlib

    matplotlib.use("Agg")
    import matplotlib.pyplot as plt

    from masstransfer import bodies, surface

    rec = surface.correlation("sphere-ranz-marshall")
    sizes = np.logspace(1, 7, 13).astype(int)
    series = {
        "gas_diffusivity (named species)": lambda x: mt.gas_diffusivity("toluene", "air", 250.0 + x),
        "correlation record (Ranz-Marshall)": lambda x: rec.nusselt(Re=x, Pr=0.7),
        "fractional_uptake (slab)": lambda x: bodies.fractional_uptake("slab", x, 1e-11, 1e-3),
        "bare numpy x**1.75": lambda x: (250.0 + x) ** 1.75,
    }
    fig, (ax, ax2) = plt.subplots(1, 2, figsize=(12.5, 4.4))
    for label, fn in series.items():
        times = []
        for n in sizes:
            x = np.linspace(1.0, 200.0, n)
            reps = max(1, int(2e5 // n))
            times.append(best(lambda fn=fn, x=x: fn(x), reps, repeat=3))
        ax.loglog(sizes, times, marker="o", ms=3, label=label)
    ref = sizes * 1e-9
    ax.loglog(sizes, ref, "k:", label="slope 1 (linear scaling)")
    ax.set_xlabel("problem size (array length)")
    ax.set_ylabel("time per call [s]")
    ax.set_title(f"masstransfer scaling, {datetime.date.today().isoformat()}, {platform.machine()}")
    ax.legend(fontsize=8)
    for style, suffix, table in (("-", "", costs), ("--", ", allocator keeping freed memory", kept)):
        for i, (label, (n_states, per_state)) in enumerate((table or {}).items()):
            ref = per_state[n_states.index(10**6)] if 10**6 in n_states else per_state[0]
            ax2.semilogx(
                n_states,
                np.asarray(per_state) / ref,
                style,
                color=f"C{i}",
                marker="o",
                ms=3,
                label=label + suffix,
            )
    ax2.axhspan(1 / 1.3, 1.3, color="0.9", label="within 1.3x of the 10^6 value")
    ax2.set_ylim(0.0, 2.0)
    ax2.set_xlabel("states per call (array length)")
    ax2.set_ylabel("cost per state / cost per state at 10^6 states")
    ax2.set_title("cost per state over its 10^6 value (flat: linear cost)")
    ax2.legend(fontsize=8)
    fig.tight_layout()
    fig.savefig(path, dpi=110)


def main() -> None:
    if sys.argv[1:2] == ["decades"]:  # one process's decade costs, as JSON (see per_state_costs_in)
        import json

        costs = per_state_costs(float(sys.argv[2]))
        print(json.dumps({"costs": costs, "first": FIRST_CALL}))
        return
    if sys.argv[1:2] == ["chunked"]:  # chunked sweep costs in a fresh process, as JSON
        import json

        print(json.dumps(chunked_costs(float(sys.argv[2]))))
        return
    if sys.argv[1:] == ["blocks"]:  # block lengths compared, as JSON (run in a fresh process)
        import json

        print(json.dumps({str(b): c for b, c in block_size_costs().items()}))
        return
    if sys.argv[1:] == ["cold-start"]:  # only the fresh-process rows; results.md is left alone
        for name, ours, base, base_name in bench_cold_start():
            print(f"| {name} | {ours:.3g} s | {base_name} | {base:.3g} s | {ours / base:.3g} |")
        return
    load_start = os.getloadavg()  # the machine is shared: its load is part of the result
    rows = [
        bench_array_fuller(),
        bench_scalar_vs_bare(),
        bench_scalar_vs_cantera("fuller"),
        bench_scalar_vs_cantera("chapman-enskog"),
        bench_liquid_viscosity(),
        *bench_records(),
        bench_analogy_numeric(),
        bench_analogy_resolved(),
        bench_uptake(),
        *bench_contactors(),
        *bench_evaporation(10_000),
        *bench_evaporation(100_000),
        bench_import(),
        *bench_cold_start(),
        *bench_quantity_check(),
    ]
    stamp = datetime.date.today().isoformat()
    machine = f"{platform.machine()}, {platform.python_implementation()} {platform.python_version()}"
    lines = [
        f"Measured {stamp} on {machine}, {__import__('os').cpu_count()} cores.",
        "",
        "| benchmark | ours | baseline | baseline time | ratio (ours / baseline) |",
        "|---|---|---|---|---|",
    ]
    for name, ours, base, base_name in rows:
        lines.append(
            f"| {name} | {ours * 1e6:.3g} µs | {base_name} | {base * 1e6:.3g} µs | {ours / base:.3g} |"
        )
    max_states = float(os.environ.get("MASSTRANSFER_BENCH_MAX_STATES", "1e8"))
    costs, first = per_state_costs_in({}, max_states)
    kept, kept_first = per_state_costs_in(KEPT_MEMORY, max_states)
    sizes = next(iter(costs.values()))[0]
    lines += [
        "",
        "Cost per state at each decade from 10^4 states (best of alternating batches up to 10^7 states,",
        "best of three calls above; each set in a fresh process; the right panel of `scaling.png`), and",
        "in brackets its ratio to the cost per state at 10^6 states. First with the allocator as it",
        "comes, then with glibc told to keep freed memory",
        "(`" + " ".join(f"{k}={v}" for k, v in KEPT_MEMORY.items()) + "`):",
        "",
        "| call | allocator | "
        + " | ".join(f"10^{round(np.log10(n))} states" for n in sizes)
        + " | largest / smallest |",
        "|---|---|" + "---|" * (len(sizes) + 1),
    ]
    for label in costs:
        for name, table in (("as it comes", costs), ("keeps freed memory", kept)):
            per_state = table[label][1]
            ref = per_state[sizes.index(10**6)]
            cells = " | ".join(f"{c * 1e9:.0f} ns ({c / ref:.2f})" for c in per_state)
            lines.append(f"| {label} | {name} | {cells} | {max(per_state) / min(per_state):.2f} |")
    largest = f"10^{round(np.log10(sizes[-1]))}"
    lines += [
        "",
        f"The first of the three calls on {largest} states in each process, which faults in memory the",
        "process has not used before, cost per state:",
        "",
        "| call | allocator as it comes | keeps freed memory |",
        "|---|---|---|",
        *(
            f"| {label} | {first[label] * 1e9:.0f} ns | {kept_first[label] * 1e9:.0f} ns |"
            for label in costs
            if label in first and label in kept_first
        ),
    ]
    touch = first_touch_cost()
    import json

    blocks = json.loads(
        subprocess.run(
            [sys.executable, __file__, "blocks"], capture_output=True, text=True, check=True
        ).stdout.splitlines()[-1]
    )
    chunked = {
        int(n): c
        for n, c in json.loads(
            subprocess.run(
                [sys.executable, __file__, "chunked", repr(max_states)],
                capture_output=True,
                text=True,
                check=True,
            ).stdout.splitlines()[-1]
        ).items()
    }
    names_in = next(label for label in costs if label.startswith("names in"))
    excess = {
        name: (firsts[names_in] - table[names_in][1][-1]) / 13
        for name, firsts, table in (("as it comes", first, costs), ("keeping freed memory", kept_first, kept))
        if names_in in firsts
    }
    best_gap = (costs[names_in][1][-1] - kept[names_in][1][-1]) / 13
    reported = touch["reported_mib"]
    cold = touch["after_pause"] > 3 * touch["fresh"]
    touch_text = (
        f"Filling a float64 array already in use costs {touch['again'] * 1e9:.2f} ns per value on this "
        f"machine; a fresh array of 5x10^7 values, allocated straight after another was freed, "
        f"{touch['fresh'] * 1e9:.2f} ns (the kernel maps and zeroes each page on first touch); the same "
        f"after ten seconds of idling, and until the kernel had finished handing free memory to its "
        f"host, {touch['after_pause'] * 1e9:.1f} ns (mean of three)."
        + (
            f" The kernel reported {reported:.0f} MiB of free memory to its host during the pauses "
            f"(`{REPORTED_KIB}`): this is a virtual machine that hands free memory back, and memory "
            "it has handed back must be supplied by the host again when it is next touched."
            if reported is not None
            else ""
        )
    )
    excess_text = (
        f"The names-in call on {largest} states writes its thirteen result arrays (the coefficients, "
        "the properties, the groups, and copies of h and T) into fresh memory. Per value of those "
        "arrays, the first call costs more than the best by "
        + " and ".join(f"{v * 1e9:.0f} ns ({k})" for k, v in excess.items())
        + ", and the best call as it comes more than the best keeping freed memory by "
        f"{best_gap * 1e9:.0f} ns. glibc's allocator as it comes returns each call's arrays to the "
        "kernel (always above 32 MiB, often from 128 KiB up) and the next call takes them afresh; "
        "told to keep freed memory, it reuses what earlier calls took. "
        + (
            "Memory supplied again by the host, as measured above, costs as much as these differences "
            "or more: between calls, the kernel hands the freed arrays to the host."
            if cold and reported is not None and max(*excess.values(), best_gap) <= 1.3 * touch["after_pause"]
            else "The fill costs above do not account for these differences on this run."
        )
    )
    lines += [
        "",
        textwrap.fill(touch_text, width=100),
        "",
        textwrap.fill(excess_text, width=100),
        "",
        "Evaluating the same chain over a design grid with `masstransfer.sweep` (blocks of 2^20 states,",
        "dask's synchronous scheduler, one core) and keeping only k_c, in a fresh process with the",
        "allocator as it comes, costs per state (in brackets, its ratio to the direct call's cost per",
        "state at 10^6 states, allocator as it comes):",
        "",
        "| call | " + " | ".join(f"10^{round(np.log10(n))} states" for n in chunked) + " |",
        "|---|" + "---|" * len(chunked),
        "| names in through masstransfer.sweep, k_c only | "
        + " | ".join(
            f"{c * 1e9:.0f} ns ({c / costs[names_in][1][sizes.index(10**6)]:.2f})" for c in chunked.values()
        )
        + " |",
        "",
        "Cost per state of the names-in chain by block length (`masstransfer._blocks.BLOCK`), in a",
        "fresh process:",
        "",
        "| block length | 10^5 states | 10^6 states | 10^7 states |",
        "|---|---|---|---|",
        *(f"| {b} | " + " | ".join(f"{c * 1e9:.0f} ns" for c in v) + " |" for b, v in blocks.items()),
    ]
    memory = [(label, n, peak_memory_ratio(n, label)) for label in _series() for n in (10**6, sizes[-1])]
    lines += [
        "",
        "Peak memory of one call (tracemalloc, numpy's own allocations) over the bytes of its inputs and",
        "outputs:",
        "",
        "| call | states | peak / (inputs + outputs) |",
        "|---|---|---|",
        *(f"| {label} | 10^{round(np.log10(n))} | {ratio:.2f} |" for label, n, ratio in memory),
    ]
    load_end = os.getloadavg()
    lines += [
        "",
        "Load average (1, 5 and 15 minutes) when the run began: "
        + ", ".join(f"{v:.2f}" for v in load_start)
        + "; when it ended: "
        + ", ".join(f"{v:.2f}" for v in load_end)
        + f" ({os.cpu_count()} cores).",
    ]
    text = "\n".join(lines)
    print(text)
    Path(__file__).with_name("results.md").write_text(text + "\n", encoding="utf-8")
    scaling_plot(Path(__file__).with_name("scaling.png"), costs, kept)
    print("wrote benchmarks/results.md and benchmarks/scaling.png")


if __name__ == "__main__":
    main()
