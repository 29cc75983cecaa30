"""The records of the catalogue: equations, envelopes and sources.

Each equation is written once, in its heat-transfer form (Nu from Re and
Pr); :class:`~masstransfer.surface.Correlation` maps Sc for Pr and Sh
for Nu.  Equation numbers refer to Incropera, DeWitt, Bergman & Lavine,
*Fundamentals of Heat and Mass Transfer*, 6th ed. (Wiley, 2007) unless
another source is named; equation numbers and ranges were transcribed
without the book at hand where marked "(from memory)".
"""

from __future__ import annotations

import functools
import math
from typing import Any

import numpy as np

from .._validation import check_positive, finish, guard, in_range
from ._record import Correlation

__all__ = ["RECORDS"]

INF = math.inf
_INC = "Incropera, DeWitt, Bergman & Lavine (2007), Fundamentals of Heat and Mass Transfer, 6th ed."


def _arr(x: Any) -> np.ndarray[Any, np.dtype[np.float64]]:
    return np.asarray(x, dtype=float)


# --- flat plate ---------------------------------------------------------------


def _fp_lam_local(Re: Any, Pr: Any) -> Any:
    return 0.332 * Re**0.5 * Pr ** (1 / 3)


def _fp_lam_avg(Re: Any, Pr: Any) -> Any:
    return 0.664 * Re**0.5 * Pr ** (1 / 3)


def _fp_lam_flux_local(Re: Any, Pr: Any) -> Any:
    return 0.453 * Re**0.5 * Pr ** (1 / 3)


def _fp_churchill_ozoe(Re: Any, Pr: Any) -> Any:
    return 0.3387 * Re**0.5 * Pr ** (1 / 3) / (1 + (0.0468 / Pr) ** (2 / 3)) ** 0.25


def _fp_turb_local(Re: Any, Pr: Any) -> Any:
    return 0.0296 * Re**0.8 * Pr ** (1 / 3)


def _fp_turb_avg(Re: Any, Pr: Any) -> Any:
    return 0.037 * Re**0.8 * Pr ** (1 / 3)


def _fp_mixed_avg(Re: Any, Pr: Any, Re_c: Any) -> Any:
    Re, Pr, Re_c = _arr(Re), _arr(Pr), _arr(Re_c)
    a = 0.037 * Re_c**0.8 - 0.664 * Re_c**0.5
    laminar = 0.664 * Re**0.5 * Pr ** (1 / 3)
    mixed = (0.037 * Re**0.8 - a) * Pr ** (1 / 3)
    return np.where(Re <= Re_c, laminar, mixed)


def _fp_unheated_lam(Re: Any, Pr: Any, xi_over_x: Any) -> Any:
    return 0.332 * Re**0.5 * Pr ** (1 / 3) / (1 - xi_over_x**0.75) ** (1 / 3)


def _fp_unheated_turb(Re: Any, Pr: Any, xi_over_x: Any) -> Any:
    return 0.0296 * Re**0.8 * Pr ** (1 / 3) / (1 - xi_over_x**0.9) ** (1 / 9)


# --- cylinder in cross flow -------------------------------------------------------


def _cyl_churchill_bernstein(Re: Any, Pr: Any) -> Any:
    return (
        0.3
        + (0.62 * Re**0.5 * Pr ** (1 / 3) / (1 + (0.4 / Pr) ** (2 / 3)) ** 0.25)
        * (1 + (Re / 282000.0) ** 0.625) ** 0.8
    )


# Hilpert constants, Table 7.2 (Re_low, C, m), from memory
_HILPERT = (
    (0.4, 0.989, 0.330),
    (4.0, 0.911, 0.385),
    (40.0, 0.683, 0.466),
    (4000.0, 0.193, 0.618),
    (40000.0, 0.027, 0.805),
)


def _table_power(Re: Any, table: tuple[tuple[float, float, float], ...]) -> tuple[Any, Any]:
    Re = _arr(Re)
    bounds = [row[0] for row in table[1:]]
    idx = np.searchsorted(np.array(bounds), Re, side="right")
    C = np.array([row[1] for row in table])[idx]
    m = np.array([row[2] for row in table])[idx]
    return C, m


def _cyl_hilpert(Re: Any, Pr: Any) -> Any:
    C, m = _table_power(Re, _HILPERT)
    return C * _arr(Re) ** m * _arr(Pr) ** (1 / 3)


# Zukauskas constants, Table 7.4 (Re_low, C, m), from memory
_ZUKAUSKAS = ((1.0, 0.75, 0.4), (40.0, 0.51, 0.5), (1000.0, 0.26, 0.6), (2.0e5, 0.076, 0.7))


def _cyl_zukauskas(Re: Any, Pr: Any, Pr_ratio: Any) -> Any:
    C, m = _table_power(Re, _ZUKAUSKAS)
    Pr = _arr(Pr)
    n = np.where(Pr <= 10.0, 0.37, 0.36)
    return C * _arr(Re) ** m * Pr**n * _arr(Pr_ratio) ** 0.25


# --- spheres, drops, bubbles -------------------------------------------------------


def _sph_ranz_marshall(Re: Any, Pr: Any) -> Any:
    return 2.0 + 0.6 * Re**0.5 * Pr ** (1 / 3)


def _sph_froessling(Re: Any, Pr: Any) -> Any:
    return 2.0 + 0.552 * Re**0.5 * Pr ** (1 / 3)


def _sph_whitaker(Re: Any, Pr: Any, mu_ratio: Any) -> Any:
    return 2.0 + (0.4 * Re**0.5 + 0.06 * Re ** (2 / 3)) * Pr**0.4 * mu_ratio**0.25


def _sph_creeping_rigid(Re: Any, Pr: Any) -> Any:
    return 1.0 + (1.0 + Re * Pr) ** (1 / 3)


def _sph_creeping_mobile(Re: Any, Pr: Any) -> Any:
    return 1.0 + (1.0 + 0.564 * (Re * Pr) ** (2 / 3)) ** 0.75


def _bubble_potential(Re: Any, Pr: Any) -> Any:
    return 2.0 / math.sqrt(math.pi) * (Re * Pr) ** 0.5


# --- ducts -------------------------------------------------------------------------


def _const(value: float) -> Any:
    def f(Re: Any, Pr: Any) -> Any:
        return value + 0.0 * _arr(Re) * _arr(Pr)

    return f


def _duct_hausen(Re: Any, Pr: Any, L_over_D: Any) -> Any:
    Gz = Re * Pr / L_over_D
    return 3.66 + 0.0668 * Gz / (1 + 0.04 * Gz ** (2 / 3))


def _duct_graetz_leveque(Re: Any, Pr: Any, L_over_D: Any) -> Any:
    Gz = Re * Pr / L_over_D
    return (3.66**3 + 0.7**3 + (1.615 * Gz ** (1 / 3) - 0.7) ** 3) ** (1 / 3)


def _duct_sieder_tate_laminar(Re: Any, Pr: Any, L_over_D: Any, mu_ratio: Any) -> Any:
    return 1.86 * (Re * Pr / L_over_D) ** (1 / 3) * mu_ratio**0.14


def _duct_dittus_boelter(Re: Any, Pr: Any, heating: Any) -> Any:
    n = np.where(_arr(heating) > 0.5, 0.4, 0.3)
    return 0.023 * _arr(Re) ** 0.8 * _arr(Pr) ** n


def _duct_sieder_tate(Re: Any, Pr: Any, mu_ratio: Any) -> Any:
    return 0.027 * Re**0.8 * Pr ** (1 / 3) * mu_ratio**0.14


@functools.lru_cache(maxsize=1)
def _friction_fit() -> tuple[np.ndarray[Any, np.dtype[np.float64]], float, float]:
    """Chebyshev fit, in ln Re, of fluids' smooth-pipe Darcy friction factor (Clamond)."""
    from fluids.friction import Clamond

    def friction_factor(Re: float, eD: float) -> float:
        return float(Clamond(Re, eD))

    lo, hi = math.log(1.0e3), math.log(1.0e9)
    n = 48
    x = np.polynomial.chebyshev.chebpts1(n)
    u = 0.5 * (lo + hi) + 0.5 * (hi - lo) * x
    f = np.array([friction_factor(math.exp(ui), eD=0.0) for ui in u])
    coef = np.polynomial.chebyshev.chebfit(x, np.log(f), n - 1)
    xm = np.cos(np.pi * np.arange(1, n) / n)
    exact = np.array([friction_factor(math.exp(0.5 * (lo + hi) + 0.5 * (hi - lo) * xi), eD=0.0) for xi in xm])
    err = np.max(np.abs(np.exp(np.polynomial.chebyshev.chebval(xm, coef)) / exact - 1))
    if err > 1e-9:  # pragma: no cover - guards a change in fluids
        raise RuntimeError(f"friction-factor interpolant error {err:.1e} exceeds 1e-9")
    return coef, lo, hi


@guard
def darcy_friction_smooth(Re: Any) -> Any:
    """Smooth-pipe Darcy friction factor from ``fluids`` (Clamond's Colebrook solution).

    Evaluated through a verified Chebyshev interpolant (relative error below
    1e-9) for 1e3 <= Re <= 1e9, and by ``fluids`` directly outside.  This is
    the turbulent (Colebrook) branch at every Re; it is not the laminar 64/Re.

    Parameters
    ----------
    Re : float or array_like
        Reynolds number [-].

    Returns
    -------
    float or numpy.ndarray
        Darcy friction factor [-].

    References
    ----------
    Clamond, D. (2009). Efficient resolution of the Colebrook equation.
    *Ind. Eng. Chem. Res.* 48, 3665-3671. https://doi.org/10.1021/ie801626g

    Examples
    --------
    >>> round(float(darcy_friction_smooth(1e5)), 5)
    0.01799

    """
    from fluids.friction import Clamond

    coef, lo, hi = _friction_fit()
    Re = _arr(check_positive("Re", Re, "pass a positive Reynolds number"))
    in_range("Re", finish(Re), 5.0, 1e15, "the Colebrook (turbulent) form is solved for 5 <= Re <= 1e15")
    u = np.log(Re)
    x = (2 * u - (lo + hi)) / (hi - lo)
    inside = (u >= lo) & (u <= hi)
    f = np.exp(np.polynomial.chebyshev.chebval(np.clip(x, -1, 1), coef))
    if not inside.all():
        f = np.where(inside, f, 0.0)
        for i in np.flatnonzero(~inside.ravel()):
            f.flat[i] = float(Clamond(float(Re.flat[i]), 0.0))
    return f


def _duct_gnielinski(Re: Any, Pr: Any) -> Any:
    f = darcy_friction_smooth(Re)
    return (f / 8) * (Re - 1000) * Pr / (1 + 12.7 * (f / 8) ** 0.5 * (Pr ** (2 / 3) - 1))


def _duct_linton_sherwood(Re: Any, Pr: Any) -> Any:
    return 0.023 * Re**0.83 * Pr ** (1 / 3)


def _wetted_wall(Re: Any, Pr: Any) -> Any:
    return 0.023 * Re**0.83 * Pr**0.44


# --- packed and fluidised beds -----------------------------------------------------


def _pb_wakao(Re: Any, Pr: Any) -> Any:
    return 2.0 + 1.1 * Re**0.6 * Pr ** (1 / 3)


def _pb_wilson_geankoplis(Re: Any, Pr: Any, porosity: Any) -> Any:
    Re, Pr, eps = _arr(Re), _arr(Pr), _arr(porosity)
    low = 1.09 / eps * Re ** (1 / 3) * Pr ** (1 / 3)
    high = 0.250 / eps * Re**0.69 * Pr ** (1 / 3)
    return np.where(Re < 55.0, low, high)


def _pb_gupta_thodos(Re: Any, Pr: Any, porosity: Any) -> Any:
    jd = (0.010 + 0.863 / (Re**0.58 - 0.483)) / porosity
    return jd * Re * Pr ** (1 / 3)


# --- free convection ---------------------------------------------------------------


def _vp_churchill_chu(Ra: Any, Pr: Any) -> Any:
    return (0.825 + 0.387 * Ra ** (1 / 6) / (1 + (0.492 / Pr) ** (9 / 16)) ** (8 / 27)) ** 2


def _vp_churchill_chu_laminar(Ra: Any, Pr: Any) -> Any:
    return 0.68 + 0.670 * Ra**0.25 / (1 + (0.492 / Pr) ** (9 / 16)) ** (4 / 9)


def _hp_upper(Ra: Any, Pr: Any) -> Any:
    Ra = _arr(Ra)
    return np.where(Ra <= 1.0e7, 0.54 * Ra**0.25, 0.15 * Ra ** (1 / 3)) + 0.0 * _arr(Pr)


def _hp_lower(Ra: Any, Pr: Any) -> Any:
    return 0.52 * _arr(Ra) ** 0.2 + 0.0 * _arr(Pr)


def _hc_churchill_chu(Ra: Any, Pr: Any) -> Any:
    return (0.60 + 0.387 * Ra ** (1 / 6) / (1 + (0.559 / Pr) ** (9 / 16)) ** (8 / 27)) ** 2


def _sph_free(Ra: Any, Pr: Any) -> Any:
    return 2.0 + 0.589 * Ra**0.25 / (1 + (0.469 / Pr) ** (9 / 16)) ** (4 / 9)


# --- interfaces and agitated systems -------------------------------------------------


def _higbie(Re: Any, Pr: Any) -> Any:
    return 2.0 / math.sqrt(math.pi) * (Re * Pr) ** 0.5


def _danckwerts(renewal: Any) -> Any:
    return _arr(renewal) ** 0.5


def _film_short(Re: Any, Pr: Any) -> Any:
    return (6.0 / math.pi * Re * Pr) ** 0.5


def _levich(Re: Any, Pr: Any) -> Any:
    return 0.62 * Re**0.5 * Pr ** (1 / 3)


def _calderbank_small(Ar: Any, Pr: Any) -> Any:
    return 0.31 * Ar ** (1 / 3) * Pr ** (1 / 3)


def _calderbank_large(Ar: Any, Pr: Any) -> Any:
    return 0.42 * Ar ** (1 / 3) * Pr**0.5


def _r(**kw: Any) -> Correlation:
    return Correlation(**kw)


_RP = ("Re", "Pr")
_RAP = ("Ra", "Pr")
_LAM = "laminar"
_TURB = "turbulent"
_ISO = "constant surface temperature/concentration"

RECORDS: tuple[Correlation, ...] = (
    # flat plate ------------------------------------------------------------------
    _r(
        slug="flat-plate-laminar-local",
        title="Laminar flat plate, local (Blasius-Pohlhausen)",
        geometry="flat plate",
        convection="forced",
        regime=_LAM,
        length="distance x from the leading edge",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (0.0, 5e5), "Pr": (0.6, INF)},
        fitted_on="both",
        reference=f"{_INC} Eq. (7.23) (Pohlhausen 1921 similarity solution)",
        accuracy="similarity solution; about 1 % for Pr >= 0.6",
        accuracy_pct=1.0,
        function=_fp_lam_local,
    ),
    _r(
        slug="flat-plate-laminar-average",
        title="Laminar flat plate, average over length L",
        geometry="flat plate",
        convection="forced",
        regime=_LAM,
        length="plate length L",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (0.0, 5e5), "Pr": (0.6, INF)},
        fitted_on="both",
        reference=f"{_INC} Eq. (7.30)",
        accuracy="similarity solution; about 1 %",
        accuracy_pct=1.0,
        function=_fp_lam_avg,
    ),
    _r(
        slug="flat-plate-laminar-flux-local",
        title="Laminar flat plate, local, uniform surface flux",
        geometry="flat plate",
        convection="forced",
        regime=_LAM,
        length="distance x from the leading edge",
        boundary="uniform surface flux",
        inputs=_RP,
        envelope={"Re": (0.0, 5e5), "Pr": (0.6, INF)},
        fitted_on="both",
        reference=f"{_INC} Eq. (7.45)",
        accuracy="boundary-layer solution; a few %",
        accuracy_pct=3.0,
        function=_fp_lam_flux_local,
    ),
    _r(
        slug="flat-plate-laminar-churchill-ozoe",
        title="Laminar flat plate, local, all Prandtl numbers",
        geometry="flat plate",
        convection="forced",
        regime=_LAM,
        length="distance x from the leading edge",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (0.0, 5e5), "Pr": (0.0, INF)},
        fitted_on="both",
        reference=f"Churchill & Ozoe (1973), J. Heat Transfer 95, 416; {_INC} Eq. (7.46)",
        accuracy="fit to the similarity solutions, within a few %; needs Re*Pr >= 100",
        accuracy_pct=3.0,
        notes="valid for Pe_x = Re_x Pr >= 100 (liquid metals included)",
        function=_fp_churchill_ozoe,
    ),
    _r(
        slug="flat-plate-turbulent-local",
        title="Turbulent flat plate, local",
        geometry="flat plate",
        convection="forced",
        regime=_TURB,
        length="distance x from the leading edge",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (5e5, 1e8), "Pr": (0.6, 60.0)},
        fitted_on="both",
        reference=f"{_INC} Eq. (7.36)",
        accuracy="about 15 % (Incropera & DeWitt, Section 7.2)",
        accuracy_pct=15.0,
        function=_fp_turb_local,
    ),
    _r(
        slug="flat-plate-turbulent-average",
        title="Flat plate, turbulent from the leading edge (tripped)",
        geometry="flat plate",
        convection="forced",
        regime=_TURB,
        length="plate length L",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (5e5, 1e8), "Pr": (0.6, 60.0)},
        fitted_on="both",
        reference=f"{_INC} Eq. (7.41)",
        accuracy="about 15 %",
        accuracy_pct=15.0,
        function=_fp_turb_avg,
    ),
    _r(
        slug="flat-plate-mixed-average",
        title="Flat plate, mixed laminar-turbulent boundary layer, average",
        geometry="flat plate",
        convection="forced",
        regime="mixed",
        length="plate length L",
        boundary=_ISO,
        inputs=_RP,
        parameters={"Re_c": 5e5},
        envelope={"Re": (0.0, 1e8), "Pr": (0.6, 60.0), "Re_c": (1e5, 3e6)},
        fitted_on="both",
        reference=f"{_INC} Eqs. (7.38)-(7.39); laminar form Eq. (7.30) below Re_c",
        accuracy="about 15 % in the turbulent part",
        accuracy_pct=15.0,
        notes="Re_c is the transition Reynolds number (5e5 by default; lower for rough or disturbed flow)",
        function=_fp_mixed_avg,
    ),
    _r(
        slug="flat-plate-unheated-start-laminar",
        title="Laminar flat plate, local, unheated starting length",
        geometry="flat plate",
        convection="forced",
        regime=_LAM,
        length="distance x from the leading edge",
        boundary=_ISO + " downstream of x = xi",
        inputs=_RP,
        parameters={"xi_over_x": None},
        envelope={"Re": (0.0, 5e5), "Pr": (0.6, INF)},
        domain={"xi_over_x": (0.0, 0.999999)},
        fitted_on="both",
        reference=f"{_INC} Eq. (7.50)",
        accuracy="integral method; a few %",
        accuracy_pct=5.0,
        notes="xi_over_x: start of the transfer section over the distance x",
        function=_fp_unheated_lam,
    ),
    _r(
        slug="flat-plate-unheated-start-turbulent",
        title="Turbulent flat plate, local, unheated starting length",
        geometry="flat plate",
        convection="forced",
        regime=_TURB,
        length="distance x from the leading edge",
        boundary=_ISO + " downstream of x = xi",
        inputs=_RP,
        parameters={"xi_over_x": None},
        envelope={"Re": (5e5, 1e8), "Pr": (0.6, 60.0)},
        domain={"xi_over_x": (0.0, 0.999999)},
        fitted_on="both",
        reference=f"{_INC} Eq. (7.51)",
        accuracy="about 15 %",
        accuracy_pct=15.0,
        function=_fp_unheated_turb,
    ),
    # cylinder ----------------------------------------------------------------------
    _r(
        slug="cylinder-churchill-bernstein",
        title="Cylinder in cross flow (Churchill-Bernstein)",
        geometry="cylinder",
        convection="forced",
        regime="all",
        length="cylinder diameter D",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (1e-2, 1e7), "Pr": (0.0, INF)},
        fitted_on="heat",
        reference=f"Churchill & Bernstein (1977), J. Heat Transfer 99, 300; {_INC} Eq. (7.54)",
        accuracy="about 20 % (Incropera & DeWitt, Section 7.4)",
        accuracy_pct=20.0,
        notes="recommended for Re*Pr >= 0.2; properties at the film temperature",
        function=_cyl_churchill_bernstein,
    ),
    _r(
        slug="cylinder-hilpert",
        title="Cylinder in cross flow, power law (Hilpert constants)",
        geometry="cylinder",
        convection="forced",
        regime="all",
        length="cylinder diameter D",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (0.4, 4e5), "Pr": (0.7, INF)},
        fitted_on="heat",
        reference=f"Hilpert (1933), Forsch. Ing.-Wes. 4, 215; {_INC} Eq. (7.52), Table 7.2 (from memory)",
        accuracy="about 20 %",
        accuracy_pct=20.0,
        function=_cyl_hilpert,
    ),
    _r(
        slug="cylinder-zukauskas",
        title="Cylinder in cross flow, power law (Zukauskas)",
        geometry="cylinder",
        convection="forced",
        regime="all",
        length="cylinder diameter D",
        boundary=_ISO,
        inputs=_RP,
        parameters={"Pr_ratio": 1.0},
        envelope={"Re": (1.0, 1e6), "Pr": (0.7, 500.0)},
        fitted_on="heat",
        reference=f"Zukauskas (1972), Adv. Heat Transfer 8, 93; {_INC} Eq. (7.53), Table 7.4 (from memory)",
        accuracy="about 20 %",
        accuracy_pct=20.0,
        notes="Pr_ratio = Pr/Pr_s (bulk over surface Prandtl number); 1 for mass transfer",
        function=_cyl_zukauskas,
    ),
    # spheres, drops, bubbles ---------------------------------------------------------
    _r(
        slug="sphere-ranz-marshall",
        title="Sphere or drop (Ranz-Marshall)",
        geometry="sphere",
        convection="forced",
        regime="all",
        length="sphere diameter D",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (0.0, 200.0), "Pr": (0.6, 380.0)},
        fitted_on="both",
        reference=f"Ranz & Marshall (1952), Chem. Eng. Prog. 48, 141 and 173; {_INC} Eq. (7.57)",
        accuracy="about 10-15 % for evaporating drops (from memory)",
        accuracy_pct=15.0,
        notes="fitted on simultaneous heat and mass transfer from evaporating drops",
        function=_sph_ranz_marshall,
    ),
    _r(
        slug="sphere-froessling",
        title="Sphere or drop (Froessling)",
        geometry="sphere",
        convection="forced",
        regime="all",
        length="sphere diameter D",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (2.0, 800.0), "Pr": (0.6, 2.7)},
        fitted_on="mass",
        reference="Froessling (1938), Gerlands Beitr. Geophys. 52, 170; Treybal, Mass-Transfer "
        "Operations, 3rd ed., Table 3.3 (from memory)",
        accuracy="about 10 % (from memory)",
        accuracy_pct=10.0,
        function=_sph_froessling,
    ),
    _r(
        slug="sphere-whitaker",
        title="Sphere (Whitaker)",
        geometry="sphere",
        convection="forced",
        regime="all",
        length="sphere diameter D",
        boundary=_ISO,
        inputs=_RP,
        parameters={"mu_ratio": 1.0},
        envelope={"Re": (3.5, 7.6e4), "Pr": (0.71, 380.0), "mu_ratio": (1.0, 3.2)},
        fitted_on="heat",
        reference=f"Whitaker (1972), AIChE J. 18, 361; {_INC} Eq. (7.56)",
        accuracy="about 30 % (Incropera & DeWitt, Section 7.5)",
        accuracy_pct=30.0,
        notes="mu_ratio = mu/mu_s (bulk over surface viscosity)",
        function=_sph_whitaker,
    ),
    _r(
        slug="sphere-creeping-rigid",
        title="Rigid sphere in creeping flow, any Peclet number",
        geometry="sphere",
        convection="forced",
        regime="creeping",
        length="sphere diameter D",
        boundary=_ISO + ", rigid (immobile) interface",
        inputs=_RP,
        envelope={"Re": (0.0, 1.0), "Pr": (0.0, INF)},
        fitted_on="both",
        reference="Clift, Grace & Weber (1978), Bubbles, Drops, and Particles, Academic Press, "
        "Eq. (3-49) (from memory)",
        accuracy="within about 5 % of numerical solutions",
        accuracy_pct=5.0,
        notes="also for small or contaminated bubbles and drops, which behave as rigid",
        function=_sph_creeping_rigid,
    ),
    _r(
        slug="drop-creeping-mobile",
        title="Circulating drop or clean bubble in creeping flow",
        geometry="bubble or drop",
        convection="forced",
        regime="creeping",
        length="drop diameter D",
        boundary=_ISO + ", fully mobile interface (continuous-phase resistance)",
        inputs=_RP,
        envelope={"Re": (0.0, 1.0), "Pr": (0.0, INF)},
        fitted_on="both",
        reference="Clift, Grace & Weber (1978), Bubbles, Drops, and Particles, Eq. (3-50) (from memory)",
        accuracy="within about 5 % of numerical solutions",
        accuracy_pct=5.0,
        function=_sph_creeping_mobile,
    ),
    _r(
        slug="bubble-mobile-potential-flow",
        title="Clean bubble with mobile interface, potential flow",
        geometry="bubble or drop",
        convection="forced",
        regime="laminar",
        length="bubble diameter D",
        boundary=_ISO + ", fully mobile interface",
        inputs=_RP,
        envelope={"Re": (100.0, 1e4), "Pr": (1.0, INF)},
        fitted_on="both",
        reference="Boussinesq (1905), J. Math. Pures Appl. 6, 285; Clift, Grace & Weber (1978), "
        "Eq. (5-39) (from memory)",
        accuracy="theory; clean systems only",
        accuracy_pct=10.0,
        notes="surfactants immobilise the interface and lower Sh towards the rigid-sphere value",
        function=_bubble_potential,
    ),
    # ducts -----------------------------------------------------------------------------
    _r(
        slug="duct-laminar-constant-wall",
        title="Circular duct, fully developed laminar, constant wall value",
        geometry="duct",
        convection="forced",
        regime=_LAM,
        length="diameter D",
        boundary="constant wall temperature/concentration",
        inputs=_RP,
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF)},
        fitted_on="both",
        reference=f"Graetz (1885), Ann. Phys. 261, 337; {_INC} Eq. (8.55)",
        accuracy="exact (theory)",
        accuracy_pct=0.5,
        function=_const(3.66),
    ),
    _r(
        slug="duct-laminar-constant-flux",
        title="Circular duct, fully developed laminar, constant wall flux",
        geometry="duct",
        convection="forced",
        regime=_LAM,
        length="diameter D",
        boundary="uniform wall flux",
        inputs=_RP,
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF)},
        fitted_on="both",
        reference=f"{_INC} Eq. (8.53)",
        accuracy="exact (theory)",
        accuracy_pct=0.5,
        function=_const(4.36),
    ),
    _r(
        slug="duct-entry-hausen",
        title="Circular duct, laminar thermal entry (Hausen), average",
        geometry="duct",
        convection="forced",
        regime=_LAM,
        length="diameter D",
        boundary="constant wall temperature/concentration, developed velocity profile",
        inputs=_RP,
        parameters={"L_over_D": None},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF)},
        domain={"L_over_D": (1e-12, INF)},
        fitted_on="heat",
        reference=f"Hausen (1943), Z. VDI Beih. Verfahrenstech. 4, 91; {_INC} Eq. (8.57)",
        accuracy="fit to the Graetz solution; a few %",
        accuracy_pct=5.0,
        notes="L_over_D = length of the transfer section over the diameter",
        function=_duct_hausen,
    ),
    _r(
        slug="duct-entry-graetz-leveque",
        title="Circular duct, laminar entry, Graetz-Leveque combination",
        geometry="duct",
        convection="forced",
        regime=_LAM,
        length="diameter D",
        boundary="constant wall temperature/concentration, developed velocity profile",
        inputs=_RP,
        parameters={"L_over_D": None},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF)},
        domain={"L_over_D": (1e-12, INF)},
        fitted_on="both",
        reference="Leveque (1928), Ann. Mines 13, 201; combination as in VDI Heat Atlas, 2nd ed. "
        "(2010), Section G1, Eq. (12) (from memory)",
        accuracy="within about 1 % of the Graetz series",
        accuracy_pct=1.0,
        function=_duct_graetz_leveque,
    ),
    _r(
        slug="duct-entry-sieder-tate-laminar",
        title="Circular duct, combined laminar entry (Sieder-Tate)",
        geometry="duct",
        convection="forced",
        regime=_LAM,
        length="diameter D",
        boundary="constant wall temperature",
        inputs=_RP,
        parameters={"L_over_D": None, "mu_ratio": 1.0},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.48, 16700.0), "mu_ratio": (0.0044, 9.75)},
        domain={"L_over_D": (1e-12, INF)},
        fitted_on="heat",
        reference=f"Sieder & Tate (1936), Ind. Eng. Chem. 28, 1429; {_INC} Eq. (8.58)",
        accuracy="about 20 %; use only where the result exceeds 3.66",
        accuracy_pct=20.0,
        function=_duct_sieder_tate_laminar,
    ),
    _r(
        slug="duct-dittus-boelter",
        title="Circular duct, turbulent (Dittus-Boelter)",
        geometry="duct",
        convection="forced",
        regime=_TURB,
        length="diameter D",
        boundary="either",
        inputs=_RP,
        parameters={"heating": 1.0},
        envelope={"Re": (1e4, 1.2e5), "Pr": (0.6, 160.0)},
        fitted_on="heat",
        domain={"heating": (0.0, 1.0)},
        reference=f"Dittus & Boelter (1930), Univ. Calif. Publ. Eng. 2, 443; {_INC} Eq. (8.60)",
        accuracy="up to 25 % (Incropera & DeWitt, Section 8.5)",
        accuracy_pct=25.0,
        notes="heating=1 for a surface hotter than the fluid (Pr^0.4), 0 for cooling (Pr^0.3); L/D >= 10",
        function=_duct_dittus_boelter,
    ),
    _r(
        slug="duct-sieder-tate",
        title="Circular duct, turbulent, large property variation (Sieder-Tate)",
        geometry="duct",
        convection="forced",
        regime=_TURB,
        length="diameter D",
        boundary="either",
        inputs=_RP,
        parameters={"mu_ratio": 1.0},
        envelope={"Re": (1e4, INF), "Pr": (0.7, 16700.0)},
        fitted_on="heat",
        reference=f"Sieder & Tate (1936), Ind. Eng. Chem. 28, 1429; {_INC} Eq. (8.61)",
        accuracy="up to 25 %",
        accuracy_pct=25.0,
        function=_duct_sieder_tate,
    ),
    _r(
        slug="duct-gnielinski",
        title="Circular duct, turbulent and transitional (Gnielinski)",
        geometry="duct",
        convection="forced",
        regime=_TURB,
        length="diameter D",
        boundary="either",
        inputs=_RP,
        envelope={"Re": (3000.0, 5e6), "Pr": (0.5, 2000.0)},
        fitted_on="heat",
        domain={"Re": (1000.0 + 1e-9, INF)},
        reference=f"Gnielinski (1976), Int. Chem. Eng. 16, 359; {_INC} Eq. (8.62); friction factor "
        "from fluids (Clamond's Colebrook solution, smooth pipe)",
        accuracy="about 10 % (from memory)",
        accuracy_pct=10.0,
        function=_duct_gnielinski,
    ),
    _r(
        slug="duct-linton-sherwood",
        title="Dissolving tube wall, turbulent (Linton-Sherwood)",
        geometry="duct",
        convection="forced",
        regime=_TURB,
        length="diameter D",
        boundary="constant wall concentration",
        inputs=_RP,
        envelope={"Re": (2000.0, 70000.0), "Pr": (1000.0, 2260.0)},
        fitted_on="mass",
        reference="Linton & Sherwood (1950), Chem. Eng. Prog. 46, 258; Treybal, Mass-Transfer "
        "Operations, 3rd ed., Table 3.3 (from memory)",
        accuracy="about 10 % (from memory)",
        accuracy_pct=10.0,
        function=_duct_linton_sherwood,
    ),
    _r(
        slug="wetted-wall-gilliland-sherwood",
        title="Wetted-wall column, gas side (Gilliland-Sherwood)",
        geometry="duct",
        convection="forced",
        regime=_TURB,
        length="column diameter D",
        boundary="constant wall concentration (evaporating film)",
        inputs=_RP,
        envelope={"Re": (2000.0, 35000.0), "Pr": (0.6, 2.5)},
        fitted_on="mass",
        reference="Gilliland & Sherwood (1934), Ind. Eng. Chem. 26, 516; Treybal, Mass-Transfer "
        "Operations, 3rd ed., Table 3.3 (from memory)",
        accuracy="about 10 % (from memory)",
        accuracy_pct=10.0,
        function=_wetted_wall,
    ),
    # packed and fluidised beds ------------------------------------------------------
    _r(
        slug="packed-bed-wakao-funazkri",
        title="Packed bed, particle-to-fluid (Wakao-Funazkri)",
        geometry="packed bed",
        convection="forced",
        regime="all",
        length="particle diameter d_p",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (3.0, 1e4), "Pr": (0.5, 1e4)},
        fitted_on="both",
        reference="Wakao & Funazkri (1978), Chem. Eng. Sci. 33, 1375; heat form Wakao, Kaguei & "
        "Funazkri (1979), Chem. Eng. Sci. 34, 325",
        accuracy="about 20-30 % (from memory)",
        accuracy_pct=25.0,
        notes="Re on superficial velocity and particle diameter",
        function=_pb_wakao,
    ),
    _r(
        slug="packed-bed-wilson-geankoplis",
        title="Packed bed of spheres, liquids (Wilson-Geankoplis)",
        geometry="packed bed",
        convection="forced",
        regime="all",
        length="particle diameter d_p",
        boundary=_ISO,
        inputs=_RP,
        parameters={"porosity": None},
        envelope={"Re": (0.0016, 1500.0), "Pr": (168.0, 70600.0), "porosity": (0.35, 0.75)},
        domain={"porosity": (1e-6, 1.0)},
        fitted_on="mass",
        reference="Wilson & Geankoplis (1966), Ind. Eng. Chem. Fundam. 5, 9; Geankoplis, Transport "
        "Processes and Unit Operations, 3rd ed., Eqs. (7.3-36)-(7.3-37) (from memory)",
        accuracy="about 20 % (from memory)",
        accuracy_pct=20.0,
        notes="two regimes switched at Re = 55; Re on superficial velocity",
        function=_pb_wilson_geankoplis,
    ),
    _r(
        slug="packed-bed-gupta-thodos",
        title="Packed or fluidised bed of spheres (Gupta-Thodos)",
        geometry="packed bed",
        convection="forced",
        regime="all",
        length="particle diameter d_p",
        boundary=_ISO,
        inputs=_RP,
        parameters={"porosity": None},
        envelope={"Re": (1.0, 2100.0), "Pr": (0.6, 1e4), "porosity": (0.35, 0.75)},
        domain={"Re": (0.3, INF), "porosity": (1e-6, 1.0)},
        fitted_on="mass",
        reference="Gupta & Thodos (1963), AIChE J. 9, 751 (from memory)",
        accuracy="about 20 % (from memory)",
        accuracy_pct=20.0,
        function=_pb_gupta_thodos,
    ),
    # free convection ------------------------------------------------------------------
    _r(
        slug="vertical-plate-churchill-chu",
        title="Vertical plate, free convection, all Ra (Churchill-Chu)",
        geometry="vertical plate",
        convection="free",
        regime="all",
        length="plate height L",
        boundary=_ISO,
        inputs=_RAP,
        envelope={"Ra": (0.1, 1e12), "Pr": (0.0, INF)},
        fitted_on="heat",
        reference=f"Churchill & Chu (1975), Int. J. Heat Mass Transfer 18, 1323; {_INC} Eq. (9.26)",
        accuracy="about 10-20 %",
        accuracy_pct=15.0,
        notes="Ra from the total density difference covers combined thermal and solutal buoyancy "
        "(masstransfer.surface.grashof_solutal)",
        function=_vp_churchill_chu,
    ),
    _r(
        slug="vertical-plate-churchill-chu-laminar",
        title="Vertical plate, free convection, laminar",
        geometry="vertical plate",
        convection="free",
        regime=_LAM,
        length="plate height L",
        boundary=_ISO,
        inputs=_RAP,
        envelope={"Ra": (0.0, 1e9), "Pr": (0.0, INF)},
        fitted_on="heat",
        reference=f"Churchill & Chu (1975); {_INC} Eq. (9.27)",
        accuracy="about 10 %",
        accuracy_pct=10.0,
        function=_vp_churchill_chu_laminar,
    ),
    _r(
        slug="horizontal-plate-upper-hot",
        title="Horizontal plate, buoyant flow away from the upper face",
        geometry="horizontal plate",
        convection="free",
        regime="all",
        length="area over perimeter A/P",
        boundary=_ISO,
        inputs=_RAP,
        envelope={"Ra": (1e4, 1e11), "Pr": (0.7, INF)},
        fitted_on="heat",
        reference=f"McAdams (1954); Goldstein, Sparrow & Jones (1973); {_INC} Eqs. (9.30)-(9.31)",
        accuracy="about 20 %",
        accuracy_pct=20.0,
        notes="upper face of a hot plate or lower face of a cold one; the surface fluid rises",
        function=_hp_upper,
    ),
    _r(
        slug="horizontal-plate-lower-hot",
        title="Horizontal plate, buoyant flow against the lower face",
        geometry="horizontal plate",
        convection="free",
        regime="all",
        length="area over perimeter A/P",
        boundary=_ISO,
        inputs=_RAP,
        envelope={"Ra": (1e4, 1e9), "Pr": (0.7, INF)},
        fitted_on="heat",
        reference="Raithby & Hollands (1998), Handbook of Heat Transfer, ch. 4; Incropera et al. "
        "7th ed. (2011), Eq. (9.32) (from memory)",
        accuracy="about 20 %",
        accuracy_pct=20.0,
        function=_hp_lower,
    ),
    _r(
        slug="horizontal-cylinder-churchill-chu",
        title="Horizontal cylinder, free convection (Churchill-Chu)",
        geometry="horizontal cylinder",
        convection="free",
        regime="all",
        length="cylinder diameter D",
        boundary=_ISO,
        inputs=_RAP,
        envelope={"Ra": (0.0, 1e12), "Pr": (0.0, INF)},
        fitted_on="heat",
        reference=f"Churchill & Chu (1975), Int. J. Heat Mass Transfer 18, 1049; {_INC} Eq. (9.34)",
        accuracy="about 10-20 %",
        accuracy_pct=15.0,
        function=_hc_churchill_chu,
    ),
    _r(
        slug="sphere-free-churchill",
        title="Sphere, free convection (Churchill)",
        geometry="sphere",
        convection="free",
        regime="all",
        length="sphere diameter D",
        boundary=_ISO,
        inputs=_RAP,
        envelope={"Ra": (0.0, 1e11), "Pr": (0.7, INF)},
        fitted_on="heat",
        reference=f"Churchill (1983), Heat Exchanger Design Handbook; {_INC} Eq. (9.35)",
        accuracy="about 10-20 %",
        accuracy_pct=15.0,
        function=_sph_free,
    ),
    # interfaces and agitated systems ----------------------------------------------------
    _r(
        slug="penetration-higbie",
        title="Penetration theory (Higbie), exposure along a length",
        geometry="gas-liquid interface",
        convection="interfacial",
        regime="all",
        length="exposure length L (contact time L/u)",
        boundary="constant interface concentration",
        inputs=_RP,
        envelope={"Re": (0.0, INF), "Pr": (0.0, INF)},
        fitted_on="both",
        reference="Higbie (1935), Trans. AIChE 31, 365; Bird, Stewart & Lightfoot, Transport "
        "Phenomena, 2nd ed., Section 20.1 (from memory)",
        accuracy="model; contact time must be known or fitted",
        accuracy_pct=30.0,
        notes="k = 2 (D/(pi t))^0.5 with t = L/u; Sh = kL/D",
        function=_higbie,
    ),
    _r(
        slug="surface-renewal-danckwerts",
        title="Surface renewal (Danckwerts)",
        geometry="gas-liquid interface",
        convection="interfacial",
        regime="all",
        length="any length L used in Sh and in the renewal group",
        boundary="constant interface concentration",
        inputs=("renewal",),
        envelope={"renewal": (0.0, INF)},
        fitted_on="both",
        reference="Danckwerts (1951), Ind. Eng. Chem. 43, 1460",
        accuracy="model; the renewal rate must be fitted",
        accuracy_pct=30.0,
        notes="renewal = s L^2 / D (s the fractional renewal rate [1/s]); k = (D s)^0.5",
        function=_danckwerts,
    ),
    _r(
        slug="falling-film-short-contact",
        title="Falling laminar film, gas absorption, short contact",
        geometry="falling film",
        convection="interfacial",
        regime=_LAM,
        length="film length L",
        boundary="constant interface concentration",
        inputs=_RP,
        envelope={"Re": (0.0, INF), "Pr": (0.0, INF)},
        fitted_on="both",
        reference="Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed. (2002), Section 18.5 "
        "(from memory)",
        accuracy="theory for a smooth laminar film",
        accuracy_pct=10.0,
        notes="Re = v_avg L / nu on the film length; valid while the penetration depth (D L/v_max)^0.5 "
        "stays well below the film thickness; ripples raise the rate",
        function=_film_short,
    ),
    _r(
        slug="falling-film-long-contact",
        title="Falling laminar film, long contact (developed profile)",
        geometry="falling film",
        convection="interfacial",
        regime=_LAM,
        length="film thickness delta",
        boundary="constant interface concentration, impermeable wall",
        inputs=_RP,
        envelope={"Re": (0.0, INF), "Pr": (0.0, INF)},
        fitted_on="both",
        reference="Emmert & Pigford (1954), Chem. Eng. Prog. 50, 87; Sh = 3.41 (from memory)",
        accuracy="theory for a smooth laminar film",
        accuracy_pct=10.0,
        function=_const(3.41),
    ),
    _r(
        slug="rotating-disk-levich",
        title="Rotating disk, laminar (Levich)",
        geometry="rotating disk",
        convection="forced",
        regime=_LAM,
        length="disk radius r",
        boundary="uniformly accessible surface",
        inputs=_RP,
        envelope={"Re": (0.0, 2e5), "Pr": (100.0, INF)},
        fitted_on="mass",
        reference="Levich (1962), Physicochemical Hydrodynamics, Prentice-Hall, ch. 2 (from memory)",
        accuracy="within about 3 % for Sc > 100",
        accuracy_pct=3.0,
        notes="Re = omega r^2 / nu; the local flux is uniform over the disk",
        function=_levich,
    ),
    _r(
        slug="stirred-vessel-calderbank-small-bubbles",
        title="Gas-liquid, small bubbles (< 2.5 mm) in stirred or sparged vessels (Calderbank-Moo-Young)",
        geometry="stirred vessel",
        convection="free",
        regime="all",
        length="bubble diameter d_b",
        boundary="rigid bubble interface",
        inputs=("Ar", "Pr"),
        envelope={"Ar": (0.0, INF), "Pr": (100.0, INF)},
        fitted_on="mass",
        reference="Calderbank & Moo-Young (1961), Chem. Eng. Sci. 16, 39",
        accuracy="about 20-30 %",
        accuracy_pct=25.0,
        notes="k_L Sc^(2/3) = 0.31 (delta_rho mu g / rho^2)^(1/3) rewritten as Sh = 0.31 Ar^(1/3) Sc^(1/3)",
        function=_calderbank_small,
    ),
    _r(
        slug="stirred-vessel-calderbank-large-bubbles",
        title="Gas-liquid, large bubbles (> 2.5 mm) in stirred or sparged vessels (Calderbank-Moo-Young)",
        geometry="stirred vessel",
        convection="free",
        regime="all",
        length="bubble diameter d_b",
        boundary="mobile bubble interface",
        inputs=("Ar", "Pr"),
        envelope={"Ar": (0.0, INF), "Pr": (100.0, INF)},
        fitted_on="mass",
        reference="Calderbank & Moo-Young (1961), Chem. Eng. Sci. 16, 39",
        accuracy="about 20-30 %",
        accuracy_pct=25.0,
        notes="k_L Sc^(1/2) = 0.42 (delta_rho mu g / rho^2)^(1/3) rewritten as Sh = 0.42 Ar^(1/3) Sc^(1/2)",
        function=_calderbank_large,
    ),
)
