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
from ..errors import InputValueError
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


def _duct_hausen(Re: Any, Pr: Any, L_over_d: Any) -> Any:
    Gz = Re * Pr / L_over_d
    return 3.66 + 0.0668 * Gz / (1 + 0.04 * Gz ** (2 / 3))


def _duct_graetz_leveque(Re: Any, Pr: Any, L_over_d: Any) -> Any:
    Gz = Re * Pr / L_over_d
    return (3.66**3 + 0.7**3 + (1.615 * Gz ** (1 / 3) - 0.7) ** 3) ** (1 / 3)


def _duct_sieder_tate_laminar(Re: Any, Pr: Any, L_over_d: Any, mu_ratio: Any) -> Any:
    return 1.86 * (Re * Pr / L_over_d) ** (1 / 3) * mu_ratio**0.14


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


def _duct_gnielinski(Re: Any, Pr: Any, roughness: Any, d_over_L: Any, Pr_ratio: Any) -> Any:
    Re, eD = _arr(Re), _arr(roughness)
    f = _darcy_petukhov(Re)
    if bool(np.any(eD > 0.0)):
        f = np.where(eD > 0.0, _darcy_colebrook(Re, eD), f)
    return _gnielinski_core(Re, Pr, f) * (1.0 + _arr(d_over_L) ** (2 / 3)) * _arr(Pr_ratio) ** 0.11


def _duct_gnielinski_smooth(Re: Any, Pr: Any) -> Any:
    return _gnielinski_core(Re, Pr, _darcy_petukhov(Re))


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


# --- friction factors as the published equations use them -------------------------


def _darcy_petukhov(Re: Any) -> Any:
    """Smooth-tube Darcy friction factor of Petukhov, the one Gnielinski's equation was fitted with."""
    return (0.790 * np.log(Re) - 1.64) ** -2


def _darcy_colebrook(Re: Any, roughness: Any) -> Any:
    """Colebrook's Darcy friction factor for a rough tube, by Clamond's explicit solution.

    Clamond (2009), Ind. Eng. Chem. Res. 48, 3665, Section 3: two steps of a
    third-order iteration on the Lambert-W form; the same algorithm as
    ``fluids.friction.Clamond``, here in numpy arithmetic so arrays need no
    element loop (checked against ``fluids`` in the tests).
    """
    Re, eD = _arr(Re), _arr(roughness)
    x1 = eD * Re * (math.log(10.0) / 18.574)
    x2 = np.log(Re) + math.log(math.log(10.0) / 5.02)
    F = x2 - 0.2
    for step in range(2):
        x1f = x1 + F
        x1f1 = 1.0 + x1f
        E = (np.log(x1f) - 0.2) / x1f1 if step == 0 else (np.log(x1f) + F - x2) / x1f1
        F = F - (x1f1 + 0.5 * E) * E * x1f / (x1f1 + E * (1.0 + E / 3.0))
    return (0.5 * math.log(10.0)) ** 2 / (F * F)


def _gnielinski_core(Re: Any, Pr: Any, f: Any) -> Any:
    Re, Pr = _arr(Re), _arr(Pr)
    den = 1.0 + 12.7 * np.sqrt(f / 8.0) * (Pr ** (2 / 3) - 1.0)
    if bool(np.any(den <= 0.0)):
        bad = np.broadcast_to(den <= 0.0, np.broadcast(Re, Pr, den).shape)
        r = float(np.broadcast_to(Re, bad.shape)[bad].ravel()[0])
        p = float(np.broadcast_to(Pr, bad.shape)[bad].ravel()[0])
        raise InputValueError(
            f"Re={r!r} with Pr={p!r} makes the denominator of Gnielinski's equation negative "
            "(a negative Nusselt number); the equation holds for Re >= 3000 and Pr >= 0.5: pass inputs there"
        )
    return (f / 8.0) * (Re - 1000.0) * Pr / den


# --- tube banks --------------------------------------------------------------------

# Incropera 6th ed. Table 7.5 (Zukauskas 1972), (Re_low, C, m); 100-1000 "as a single isolated
# cylinder", taken from Table 7.4's 40-1000 row (C = 0.51, m = 0.5) (from memory)
_BANK_INLINE = ((10.0, 0.80, 0.40), (100.0, 0.51, 0.50), (1000.0, 0.27, 0.63), (2.0e5, 0.021, 0.84))
_BANK_STAGGERED = ((10.0, 0.90, 0.40), (100.0, 0.51, 0.50), (1000.0, 0.40, 0.60), (2.0e5, 0.022, 0.84))

# Incropera 6th ed. Table 7.6, row correction C2 for N_L < 20 (from memory); 1 from 20 rows on
_ROWS = np.array([1.0, 2.0, 3.0, 4.0, 5.0, 7.0, 10.0, 13.0, 16.0, 20.0])
_ROWS_INLINE = np.array([0.70, 0.80, 0.86, 0.90, 0.92, 0.95, 0.97, 0.98, 0.99, 1.0])
_ROWS_STAGGERED = np.array([0.64, 0.76, 0.84, 0.89, 0.92, 0.95, 0.97, 0.98, 0.99, 1.0])


def _bank_inline(Re: Any, Pr: Any, Pr_ratio: Any, rows: Any) -> Any:
    C, m = _table_power(Re, _BANK_INLINE)
    C2 = np.interp(_arr(rows), _ROWS, _ROWS_INLINE)
    return C2 * C * _arr(Re) ** m * _arr(Pr) ** 0.36 * _arr(Pr_ratio) ** 0.25


def _bank_staggered(Re: Any, Pr: Any, Pr_ratio: Any, rows: Any, ST_over_SL: Any) -> Any:
    Re = _arr(Re)
    C, m = _table_power(Re, _BANK_STAGGERED)
    # 1000-2e5: C = 0.35 (S_T/S_L)^(1/5) for S_T/S_L < 2, 0.40 for S_T/S_L >= 2
    pitch = _arr(ST_over_SL)
    C = np.where((Re >= 1000.0) & (Re < 2.0e5), np.where(pitch < 2.0, 0.35 * pitch**0.2, 0.40), C)
    C2 = np.interp(_arr(rows), _ROWS, _ROWS_STAGGERED)
    return C2 * C * Re**m * _arr(Pr) ** 0.36 * _arr(Pr_ratio) ** 0.25


# --- impinging jets (Martin 1977) ----------------------------------------------------


def _jet_round(Re: Any, Pr: Any, H_over_d: Any, area_ratio: Any) -> Any:
    s = _arr(area_ratio) ** 0.5
    G = 2.0 * s * (1.0 - 2.2 * s) / (1.0 + 0.2 * (_arr(H_over_d) - 6.0) * s)
    return G * 2.0 * Re**0.5 * (1.0 + 0.005 * Re**0.55) ** 0.5 * Pr**0.42


def _jet_slot(Re: Any, Pr: Any, H_over_W: Any, area_ratio: Any) -> Any:
    Ar, HW = _arr(area_ratio), _arr(H_over_W)
    m = 0.695 - 1.0 / (1.0 / (4.0 * Ar) + (HW / 2.0) ** 1.33 + 3.06)
    return 3.06 / (0.5 / Ar + HW + 2.78) * _arr(Re) ** m * _arr(Pr) ** 0.42


# --- annuli and non-circular ducts, laminar, fully developed -------------------------

# Incropera 6th ed. Table 8.2 (Kays & Perkins), one wall isothermal, the other insulated (from memory)
_ANN_RATIO = np.array([0.0, 0.05, 0.10, 0.25, 0.50, 1.0])
_ANN_INNER = np.array([np.nan, 17.46, 11.56, 7.37, 5.74, 4.86])
_ANN_OUTER = np.array([3.66, 4.06, 4.11, 4.23, 4.43, 4.86])

# Incropera 6th ed. Table 8.1 (Shah & London), rectangle of sides a <= b; aspect a/b (from memory)
_RECT_ASPECT = np.array([0.0, 1 / 8.0, 1 / 4.0, 1 / 3.0, 1 / 2.0, 1 / 1.43, 1.0])
_RECT_FLUX = np.array([8.23, 6.49, 5.33, 4.79, 4.12, 3.73, 3.61])
_RECT_WALL = np.array([7.54, 5.60, 4.44, 3.96, 3.39, 3.08, 2.98])


def _annulus_inner(Re: Any, Pr: Any, di_over_do: Any) -> Any:
    return np.interp(_arr(di_over_do), _ANN_RATIO[1:], _ANN_INNER[1:]) + 0.0 * _arr(Re) * _arr(Pr)


def _annulus_outer(Re: Any, Pr: Any, di_over_do: Any) -> Any:
    return np.interp(_arr(di_over_do), _ANN_RATIO, _ANN_OUTER) + 0.0 * _arr(Re) * _arr(Pr)


def _rect_wall(Re: Any, Pr: Any, aspect_ratio: Any) -> Any:
    return np.interp(_arr(aspect_ratio), _RECT_ASPECT, _RECT_WALL) + 0.0 * _arr(Re) * _arr(Pr)


def _rect_flux(Re: Any, Pr: Any, aspect_ratio: Any) -> Any:
    return np.interp(_arr(aspect_ratio), _RECT_ASPECT, _RECT_FLUX) + 0.0 * _arr(Re) * _arr(Pr)


# --- transitional duct flow (Gnielinski 2013) -----------------------------------------


def _gnielinski_laminar_mean(Re: Any, Pr: Any, d_over_L: Any) -> Any:
    x = Re * Pr * d_over_L
    nu2 = 1.615 * x ** (1 / 3)
    nu3 = (2.0 / (1.0 + 22.0 * Pr)) ** (1 / 6) * x**0.5
    return (3.66**3 + 0.7**3 + (nu2 - 0.7) ** 3 + nu3**3) ** (1 / 3)


def _gnielinski_turbulent_mean(Re: Any, Pr: Any, d_over_L: Any) -> Any:
    xi = (1.8 * np.log10(Re) - 1.5) ** -2
    return (
        (xi / 8.0)
        * Re
        * Pr
        / (1.0 + 12.7 * np.sqrt(xi / 8.0) * (Pr ** (2 / 3) - 1.0))
        * (1.0 + d_over_L ** (2 / 3))
    )


def _duct_transitional(Re: Any, Pr: Any, d_over_L: Any) -> Any:
    Re, Pr, dl = _arr(Re), _arr(Pr), _arr(d_over_L)
    gamma = (Re - 2300.0) / (1.0e4 - 2300.0)
    lam = _gnielinski_laminar_mean(2300.0, Pr, dl)
    turb = _gnielinski_turbulent_mean(1.0e4, Pr, dl)
    return (1.0 - gamma) * lam + gamma * turb


# --- drops: continuous phase with a viscosity ratio, and inside the drop ---------------


def _drop_circulating(Re: Any, Pr: Any, viscosity_ratio: Any) -> Any:
    return (4.0 / (3.0 * math.pi)) ** 0.5 * (Re * Pr / (1.0 + viscosity_ratio)) ** 0.5


def _drop_oscillating(Re: Any, Pr: Any, viscosity_ratio: Any) -> Any:
    return 0.00375 * Re * Pr / (1.0 + viscosity_ratio)


# --- spheres in liquids -------------------------------------------------------------------


def _sph_high_peclet(Re: Any, Pr: Any) -> Any:
    return 0.991 * (Re * Pr) ** (1 / 3) + 0.922


def _sph_liquid_clift(Re: Any, Pr: Any) -> Any:
    Re, Pr = _arr(Re), _arr(Pr)
    low = 1.0 + (1.0 + 1.0 / (Re * Pr)) ** (1 / 3) * Re**0.41 * Pr ** (1 / 3)
    high = 1.0 + 0.752 * Re**0.472 * Pr ** (1 / 3)
    return np.where(Re <= 100.0, low, high)


# --- rotating bodies ----------------------------------------------------------------------


def _rotating_cylinder(Re: Any, Pr: Any) -> Any:
    return 0.0791 * Re**0.70 * Pr**0.356


def _newman(Re: Any, Pr: Any) -> Any:
    c = Pr ** (-1 / 3)
    return 0.62048 * Re**0.5 * Pr ** (1 / 3) / (1.0 + 0.2980 * c + 0.14514 * c * c)


# --- enclosures -----------------------------------------------------------------------------


def _enclosure_horizontal(Ra: Any, Pr: Any) -> Any:
    return 0.069 * Ra ** (1 / 3) * Pr**0.074


def _enclosure_catton_tall(Ra: Any, Pr: Any, H_over_L: Any) -> Any:
    return 0.22 * (Pr / (0.2 + Pr) * Ra) ** 0.28 * H_over_L**-0.25


def _enclosure_catton_square(Ra: Any, Pr: Any) -> Any:
    return 0.18 * (Pr / (0.2 + Pr) * Ra) ** 0.29


def _enclosure_macgregor_emery(Ra: Any, Pr: Any, H_over_L: Any) -> Any:
    return 0.42 * Ra**0.25 * Pr**0.012 * H_over_L**-0.3


# --- mixed convection (Churchill's blending rule) ----------------------------------------------


def _vp_mixed(Re: Any, Pr: Any, Ra: Any) -> Any:
    forced = _fp_lam_avg(Re, Pr)
    free = _vp_churchill_chu(Ra, Pr)
    return (forced**3 + free**3) ** (1 / 3)


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
        accuracy="fit to the similarity solution; within 2 % for Pr >= 0.6 (+1.1 % at 0.6, -2.0 % as "
        "Pr grows)",
        accuracy_pct=2.0,
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
        accuracy="fit to the similarity solution; within 2 % for Pr >= 0.6",
        accuracy_pct=2.0,
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
        notes="valid for Pe_x = Re_x Pr >= 100 (liquid metals included); enforced as an envelope input",
        products={"Pe": (("Re", "Pr"), (100.0, INF))},
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
        length="cylinder diameter d",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (1e-2, 1e7), "Pr": (0.0, INF)},
        fitted_on="heat",
        reference=f"Churchill & Bernstein (1977), J. Heat Transfer 99, 300; {_INC} Eq. (7.54)",
        accuracy="about 20 % (Incropera & DeWitt, Section 7.4)",
        accuracy_pct=20.0,
        notes="recommended for Re*Pr >= 0.2 (enforced as an envelope input); properties at the film "
        "temperature",
        products={"Pe": (("Re", "Pr"), (0.2, INF))},
        function=_cyl_churchill_bernstein,
    ),
    _r(
        slug="cylinder-hilpert",
        title="Cylinder in cross flow, power law (Hilpert constants)",
        geometry="cylinder",
        convection="forced",
        regime="all",
        length="cylinder diameter d",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (0.4, 4e5), "Pr": (0.7, INF)},
        fitted_on="heat",
        reference=f"Hilpert (1933), Forsch. Ing.-Wes. 4, 215; {_INC} Eq. (7.52), Table 7.2 (from memory)",
        accuracy="about 20 %",
        accuracy_pct=20.0,
        notes="the tabulated constants change at Re = 4, 40, 4000 and 40000 without blending; the "
        "value jumps by up to 1.5 % there (see steps)",
        steps=(("Re", 4.0, -0.6), ("Re", 40.0, 1.1), ("Re", 40000.0, 1.5)),
        function=_cyl_hilpert,
    ),
    _r(
        slug="cylinder-zukauskas",
        title="Cylinder in cross flow, power law (Zukauskas)",
        geometry="cylinder",
        convection="forced",
        regime="all",
        length="cylinder diameter d",
        boundary=_ISO,
        inputs=_RP,
        parameters={"Pr_ratio": 1.0},
        envelope={"Re": (1.0, 1e6), "Pr": (0.7, 500.0)},
        fitted_on="heat",
        reference=f"Zukauskas (1972), Adv. Heat Transfer 8, 93; {_INC} Eq. (7.53), Table 7.4 (from memory)",
        accuracy="about 20 %",
        accuracy_pct=20.0,
        notes="Pr_ratio = Pr/Pr_s (bulk over surface Prandtl number); 1 for mass transfer; the "
        "tabulated constants change at Re = 40, 1000 and 2e5, and the Pr exponent at Pr = 10, "
        "without blending (steps of up to 2.3 %, see steps)",
        steps=(("Re", 40.0, -1.7), ("Re", 1000.0, 1.7), ("Re", 2.0e5, -0.9), ("Pr", 10.0, -2.3)),
        function=_cyl_zukauskas,
    ),
    # spheres, drops, bubbles ---------------------------------------------------------
    _r(
        slug="sphere-ranz-marshall",
        title="Sphere or drop (Ranz-Marshall)",
        geometry="sphere",
        convection="forced",
        regime="all",
        length="sphere diameter d",
        boundary=_ISO,
        inputs=_RP,
        envelope={"Re": (0.0, 200.0), "Pr": (0.6, 2.7)},
        fitted_on="both",
        reference=f"Ranz & Marshall (1952), Chem. Eng. Prog. 48, 141 and 173; {_INC} Eq. (7.57)",
        accuracy="about 10-15 % for evaporating drops (from memory)",
        accuracy_pct=15.0,
        notes="fitted on simultaneous heat and mass transfer from drops evaporating into air, so Pr "
        "and Sc of gases (0.6 to 2.7, from memory); for spheres in liquids use sphere-liquid-clift "
        "or, in creeping flow, sphere-creeping-high-peclet",
        function=_sph_ranz_marshall,
    ),
    _r(
        slug="sphere-froessling",
        title="Sphere or drop (Froessling)",
        geometry="sphere",
        convection="forced",
        regime="all",
        length="sphere diameter d",
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
        length="sphere diameter d",
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
        length="sphere diameter d",
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
        length="drop diameter d",
        boundary=_ISO + ", fully mobile interface (continuous-phase resistance)",
        inputs=_RP,
        envelope={"Re": (0.0, 1.0), "Pr": (0.0, INF)},
        fitted_on="both",
        reference="Clift, Grace & Weber (1978), Bubbles, Drops, and Particles, Eq. (3-50) (from memory)",
        accuracy="within about 5 % of numerical solutions, for viscosity ratio 0",
        accuracy_pct=5.0,
        notes="the clean bubble: drop over continuous-phase viscosity ratio 0; a drop of ratio 1 "
        "transfers up to about 40 % less (drop-creeping-circulating takes the ratio)",
        function=_sph_creeping_mobile,
    ),
    _r(
        slug="bubble-mobile-potential-flow",
        title="Clean bubble with mobile interface, potential flow",
        geometry="bubble or drop",
        convection="forced",
        regime="laminar",
        length="bubble diameter d",
        boundary=_ISO + ", fully mobile interface",
        inputs=_RP,
        envelope={"Re": (100.0, 1e4), "Pr": (1.0, INF)},
        fitted_on="both",
        reference="Boussinesq (1905), J. Math. Pures Appl. 6, 285; Clift, Grace & Weber (1978), "
        "Eq. (5-39) (from memory)",
        accuracy="exact as Re -> infinity; at Re = 100 about 19 % above the boundary-layer-corrected "
        "form with (1 - 2.89 Re^(-1/2))^(1/2) (Clift, Grace & Weber, ch. 5, from memory); clean "
        "systems only",
        accuracy_pct=20.0,
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
        length="diameter d",
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
        length="diameter d",
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
        length="diameter d",
        boundary="constant wall temperature/concentration, developed velocity profile",
        inputs=_RP,
        parameters={"L_over_d": None},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF)},
        domain={"L_over_d": (1e-12, INF)},
        fitted_on="heat",
        reference=f"Hausen (1943), Z. VDI Beih. Verfahrenstech. 4, 91; {_INC} Eq. (8.57)",
        accuracy="fit to the Graetz solution: within 2 % for Gz = Re Pr d/L <= 100, up to about 11 % "
        "above it near Gz = 1e3 to 1e4 (+3.4 % as Gz grows without bound)",
        accuracy_pct=11.0,
        notes="L_over_d = length of the transfer section over the diameter",
        function=_duct_hausen,
    ),
    _r(
        slug="duct-entry-graetz-leveque",
        title="Circular duct, laminar entry, Graetz-Leveque combination",
        geometry="duct",
        convection="forced",
        regime=_LAM,
        length="diameter d",
        boundary="constant wall temperature/concentration, developed velocity profile",
        inputs=_RP,
        parameters={"L_over_d": None},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF)},
        domain={"L_over_d": (1e-12, INF)},
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
        length="diameter d",
        boundary="constant wall temperature",
        inputs=_RP,
        parameters={"L_over_d": None, "mu_ratio": 1.0},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.48, 16700.0), "mu_ratio": (0.0044, 9.75)},
        domain={"L_over_d": (1e-12, INF)},
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
        length="diameter d",
        boundary="either",
        inputs=_RP,
        parameters={"heating": 1.0},
        envelope={"Re": (1e4, 1.2e5), "Pr": (0.6, 160.0)},
        fitted_on="heat",
        domain={"heating": (0.0, 1.0)},
        reference=f"Dittus & Boelter (1930), Univ. Calif. Publ. Eng. 2, 443; {_INC} Eq. (8.60)",
        accuracy="up to 25 % (Incropera & DeWitt, Section 8.5)",
        accuracy_pct=25.0,
        notes="heating=1 for a surface hotter than the fluid (Pr^0.4), 0 for cooling (Pr^0.3); L/d >= 10",
        function=_duct_dittus_boelter,
    ),
    _r(
        slug="duct-sieder-tate",
        title="Circular duct, turbulent, large property variation (Sieder-Tate)",
        geometry="duct",
        convection="forced",
        regime=_TURB,
        length="diameter d",
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
        length="diameter d",
        boundary="either",
        inputs=_RP,
        parameters={"roughness": 0.0, "d_over_L": 0.0, "Pr_ratio": 1.0},
        envelope={
            "Re": (3000.0, 5e6),
            "Pr": (0.5, 2000.0),
            "roughness": (0.0, 0.05),
            "d_over_L": (0.0, 1.0),
            "Pr_ratio": (0.05, 20.0),
        },
        fitted_on="heat",
        domain={"Re": (1000.0 + 1e-9, INF), "roughness": (0.0, 1.0)},
        reference=f"Gnielinski (1976), Int. Chem. Eng. 16, 359, with Petukhov's smooth-tube friction "
        f"factor (0.790 ln Re - 1.64)^-2; {_INC} Eqs. (8.62) and (8.21); entrance factor "
        "1 + (d/L)^(2/3) and liquid property factor (Pr/Pr_w)^0.11 as in VDI Heat Atlas, 2nd ed. "
        "(2010), Section G1, Eqs. (27)-(29) (from memory); rough tubes with Colebrook's friction "
        "factor (Clamond's solution, as in fluids.friction.Clamond)",
        accuracy="about 10 % for smooth tubes (from memory); rough tubes with the Colebrook friction "
        "factor are an extension the source allows, less well tested",
        accuracy_pct=10.0,
        notes="roughness = relative roughness e/d (0: smooth tube, Petukhov's friction factor); "
        "d_over_L = d/L for the mean over a tube of length L (0: fully developed); Pr_ratio = "
        "Pr/Pr_w for liquids (1 for gases and for mass transfer)",
        function=_duct_gnielinski,
    ),
    _r(
        slug="duct-linton-sherwood",
        title="Dissolving tube wall, turbulent (Linton-Sherwood)",
        geometry="duct",
        convection="forced",
        regime=_TURB,
        length="diameter d",
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
        length="column diameter d",
        boundary="constant wall concentration (evaporating film)",
        inputs=_RP,
        envelope={"Re": (2000.0, 35000.0), "Pr": (0.6, 2.5)},
        fitted_on="mass",
        reference="Gilliland & Sherwood (1934), Ind. Eng. Chem. 26, 516; Treybal, Mass-Transfer "
        "Operations, 3rd ed., Table 3.3 (from memory)",
        accuracy="about 10 % (from memory)",
        accuracy_pct=10.0,
        notes="F-type basis: the source correlated Sh p_BM/P, so the value is F d/(c D_AB) (film "
        "factor F = k_G p_BM), which already contains the bulk-flow correction for diffusion "
        "through a stagnant gas; use it with high_flux_rate or as a low-flux k_c, and do not "
        "divide by y_BM again",
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
        envelope={"Re": (0.0016, 1500.0), "Pr": (165.0, 70600.0), "porosity": (0.35, 0.75)},
        branches=(("Re", 0.0, 55.0, {"Pr": (950.0, 70600.0)}), ("Re", 55.0, INF, {"Pr": (165.0, 10690.0)})),
        domain={"porosity": (1e-6, 1.0)},
        fitted_on="mass",
        reference="Wilson & Geankoplis (1966), Ind. Eng. Chem. Fundam. 5, 9 (abstract: Re 0.0016 to "
        "55, Sc 950 to 70600); Geankoplis, Transport Processes and Unit Operations, 3rd ed., "
        "Eqs. (7.3-36)-(7.3-37) (high branch Sc 165 to 10690, from memory)",
        accuracy="about 20 % (from memory)",
        accuracy_pct=20.0,
        notes="two branches fitted over different Sc ranges, each with its own envelope; the source "
        "switches at Re = 55 without blending, where the value drops by 4.2 %; Re on superficial "
        "velocity",
        steps=(("Re", 55.0, -4.2),),
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
        notes="upper face of a hot plate or lower face of a cold one; the surface fluid rises; the "
        "source switches from 0.54 Ra^(1/4) to 0.15 Ra^(1/3) at Ra = 1e7 without blending, where "
        "the value rises by 6.4 % (inside the stated 20 %)",
        steps=(("Ra", 1.0e7, 6.4),),
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
        length="cylinder diameter d",
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
        length="sphere diameter d",
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
        notes="k_c = 2 (D/(pi t))^0.5 with t = L/u; Sh = k_c L/D",
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
        notes="renewal = s L^2 / D (s the fractional renewal rate [1/s]); k_c = (D s)^0.5",
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
        accuracy="the Sc -> infinity limit: 7.1 % above Newman's series at Sc = 100, 3.1 % at Sc = 1000",
        accuracy_pct=7.1,
        notes="Re = omega r^2 / nu; the local flux is uniform over the disk; rotating-disk-newman "
        "corrects for finite Sc",
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
    # tube banks ---------------------------------------------------------------------------
    _r(
        slug="tube-bank-inline-zukauskas",
        title="Tube bank in cross flow, in-line (aligned) rows (Zukauskas)",
        geometry="tube bank",
        convection="forced",
        regime="all",
        length="tube outer diameter d; Re on the maximum velocity between the tubes",
        boundary=_ISO,
        inputs=_RP,
        parameters={"Pr_ratio": 1.0, "rows": 20.0},
        envelope={"Re": (10.0, 2e6), "Pr": (0.7, 500.0)},
        domain={"rows": (1.0, INF)},
        fitted_on="heat",
        reference=f"Zukauskas (1972), Adv. Heat Transfer 8, 93; {_INC} Eq. (7.58), Tables 7.5 and 7.6 "
        "(from memory)",
        accuracy="about 15-20 % (Incropera & DeWitt, Section 7.6)",
        accuracy_pct=20.0,
        notes="average over the bank; Pr_ratio = Pr/Pr_s (1 for mass transfer); rows = number of rows "
        "N_L, with the row correction C2 of Table 7.6 interpolated linearly between tabulated rows "
        "(1 from 20 rows on; the table was given for Re >= 1000 and is applied at every Re here); "
        "100 <= Re < 1000 uses the single-cylinder constants as the source advises; the source's "
        "constants change at Re = 100, 1000 and 2e5 without blending: the value jumps by 30 % at "
        "Re = 1000, more than the stated accuracy, so near there the truth lies between the branches",
        steps=(("Re", 100.0, 1.0), ("Re", 1000.0, 30.0), ("Re", 2.0e5, 0.9)),
        function=_bank_inline,
    ),
    _r(
        slug="tube-bank-staggered-zukauskas",
        title="Tube bank in cross flow, staggered rows (Zukauskas)",
        geometry="tube bank",
        convection="forced",
        regime="all",
        length="tube outer diameter d; Re on the maximum velocity between the tubes",
        boundary=_ISO,
        inputs=_RP,
        parameters={"Pr_ratio": 1.0, "rows": 20.0, "ST_over_SL": None},
        envelope={"Re": (10.0, 2e6), "Pr": (0.7, 500.0), "ST_over_SL": (0.5, 4.0)},
        domain={"rows": (1.0, INF), "ST_over_SL": (1e-6, INF)},
        fitted_on="heat",
        reference=f"Zukauskas (1972), Adv. Heat Transfer 8, 93; {_INC} Eq. (7.58), Tables 7.5 and 7.6 "
        "(from memory)",
        accuracy="about 15-20 % (Incropera & DeWitt, Section 7.6)",
        accuracy_pct=20.0,
        notes="ST_over_SL = transverse over longitudinal pitch (C = 0.35 (S_T/S_L)^(1/5) below 2, "
        "0.40 from 2, for 1000 <= Re < 2e5); rows = N_L with the row correction of Table 7.6; "
        "Pr_ratio = Pr/Pr_s; the source's constants change at Re = 100, 1000 and 2e5 without "
        "blending: the value jumps by -10 %, +37 % and +18 % there (at ST_over_SL = 1; the jump at "
        "1000 depends on ST_over_SL), more than the stated accuracy, so near a switch the truth lies "
        "between the branches",
        steps=(("Re", 100.0, -10.2), ("Re", 1000.0, 36.9), ("Re", 2.0e5, 17.7)),
        function=_bank_staggered,
    ),
    # impinging jets ---------------------------------------------------------------------------
    _r(
        slug="jet-round-martin",
        title="Single round jet impinging on a plate, average over a circle (Martin)",
        geometry="impinging round jet",
        convection="forced",
        regime=_TURB,
        length="nozzle diameter d (Re on the nozzle exit velocity)",
        boundary=_ISO,
        inputs=_RP,
        parameters={"H_over_d": None, "area_ratio": None},
        envelope={
            "Re": (2000.0, 4e5),
            "Pr": (0.6, 10.0),
            "H_over_d": (2.0, 12.0),
            "area_ratio": (0.004, 0.04),
        },
        domain={"H_over_d": (1e-6, INF), "area_ratio": (1e-12, 0.2)},
        fitted_on="heat",
        reference=f"Martin (1977), Adv. Heat Transfer 13, 1; {_INC} Eqs. (7.79)-(7.80) (from memory)",
        accuracy="about 15 % (from memory)",
        accuracy_pct=15.0,
        notes="H_over_d = nozzle-to-plate distance over d; area_ratio = d^2/(4 r^2), r the radius of "
        "the circle the average is taken over; the data behind it were for gases, and the Pr^0.42 "
        "dependence was taken from other work, so the Pr envelope here (0.6 to 10) is a cautious "
        "choice of this library, not the source's",
        function=_jet_round,
    ),
    _r(
        slug="jet-slot-martin",
        title="Single slot jet impinging on a plate, average over a strip (Martin)",
        geometry="impinging slot jet",
        convection="forced",
        regime=_TURB,
        length="hydraulic diameter 2W of the slot (W its width); Re on the exit velocity",
        boundary=_ISO,
        inputs=_RP,
        parameters={"H_over_W": None, "area_ratio": None},
        envelope={
            "Re": (3000.0, 9e4),
            "Pr": (0.6, 10.0),
            "H_over_W": (2.0, 10.0),
            "area_ratio": (0.025, 0.125),
        },
        domain={"H_over_W": (1e-6, INF), "area_ratio": (1e-12, INF)},
        fitted_on="heat",
        reference=f"Martin (1977), Adv. Heat Transfer 13, 1; {_INC} Eqs. (7.83)-(7.84) (from memory)",
        accuracy="about 15 % (from memory)",
        accuracy_pct=15.0,
        notes="H_over_W = nozzle-to-plate distance over the slot width; area_ratio = W/(2x), x the "
        "half-width of the strip the average is taken over; the Pr envelope (0.6 to 10) is a "
        "cautious choice of this library, as for jet-round-martin",
        function=_jet_slot,
    ),
    # annuli and non-circular ducts --------------------------------------------------------------
    _r(
        slug="annulus-laminar-inner-wall",
        title="Concentric annulus, fully developed laminar, transfer at the inner wall",
        geometry="annulus",
        convection="forced",
        regime=_LAM,
        length="hydraulic diameter d_o - d_i",
        boundary="inner wall at constant temperature/concentration, outer wall insulated",
        inputs=_RP,
        parameters={"di_over_do": None},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF), "di_over_do": (0.05, 1.0)},
        domain={"di_over_do": (0.05, 1.0)},
        fitted_on="both",
        reference=f"Kays & Perkins, in Handbook of Heat Transfer (1972), ch. 7; {_INC} Table 8.2 "
        "(from memory)",
        accuracy="theory at the tabulated diameter ratios; linear interpolation between them",
        accuracy_pct=5.0,
        notes="di_over_do = inner over outer diameter; tabulated at 0.05, 0.10, 0.25, 0.50 and 1",
        function=_annulus_inner,
    ),
    _r(
        slug="annulus-laminar-outer-wall",
        title="Concentric annulus, fully developed laminar, transfer at the outer wall",
        geometry="annulus",
        convection="forced",
        regime=_LAM,
        length="hydraulic diameter d_o - d_i",
        boundary="outer wall at constant temperature/concentration, inner wall insulated",
        inputs=_RP,
        parameters={"di_over_do": None},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF), "di_over_do": (0.0, 1.0)},
        domain={"di_over_do": (0.0, 1.0)},
        fitted_on="both",
        reference=f"Kays & Perkins, in Handbook of Heat Transfer (1972), ch. 7; {_INC} Table 8.2 "
        "(from memory)",
        accuracy="theory at the tabulated diameter ratios; linear interpolation between them",
        accuracy_pct=5.0,
        notes="di_over_do = inner over outer diameter (0: circular tube, 3.66)",
        function=_annulus_outer,
    ),
    _r(
        slug="rectangular-duct-laminar-constant-wall",
        title="Rectangular duct, fully developed laminar, constant wall value",
        geometry="non-circular duct",
        convection="forced",
        regime=_LAM,
        length="hydraulic diameter 4A/P",
        boundary="constant wall temperature/concentration on all four walls",
        inputs=_RP,
        parameters={"aspect_ratio": None},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF), "aspect_ratio": (0.0, 1.0)},
        domain={"aspect_ratio": (0.0, 1.0)},
        fitted_on="both",
        reference=f"Shah & London (1978), Laminar Flow Forced Convection in Ducts, Academic Press; "
        f"{_INC} Table 8.1 (from memory)",
        accuracy="theory at the tabulated aspect ratios; linear interpolation between them",
        accuracy_pct=5.0,
        notes="aspect_ratio = short side over long side (1 square, 0 parallel plates); tabulated at "
        "b/a = 1, 1.43, 2, 3, 4, 8 and infinity",
        function=_rect_wall,
    ),
    _r(
        slug="rectangular-duct-laminar-constant-flux",
        title="Rectangular duct, fully developed laminar, uniform wall flux",
        geometry="non-circular duct",
        convection="forced",
        regime=_LAM,
        length="hydraulic diameter 4A/P",
        boundary="uniform wall flux, peripherally uniform wall temperature",
        inputs=_RP,
        parameters={"aspect_ratio": None},
        envelope={"Re": (0.0, 2300.0), "Pr": (0.0, INF), "aspect_ratio": (0.0, 1.0)},
        domain={"aspect_ratio": (0.0, 1.0)},
        fitted_on="both",
        reference=f"Shah & London (1978), Laminar Flow Forced Convection in Ducts; {_INC} Table 8.1 "
        "(from memory)",
        accuracy="theory at the tabulated aspect ratios; linear interpolation between them",
        accuracy_pct=5.0,
        notes="aspect_ratio = short side over long side (1 square, 0 parallel plates)",
        function=_rect_flux,
    ),
    _r(
        slug="noncircular-duct-turbulent-gnielinski",
        title="Annulus or non-circular duct, turbulent, on the hydraulic diameter (Gnielinski)",
        geometry="non-circular duct",
        convection="forced",
        regime=_TURB,
        length="hydraulic diameter 4A/P (d_o - d_i for an annulus)",
        boundary="either",
        inputs=_RP,
        envelope={"Re": (3000.0, 5e6), "Pr": (0.5, 2000.0)},
        domain={"Re": (1000.0 + 1e-9, INF)},
        fitted_on="heat",
        reference=f"Gnielinski (1976), Int. Chem. Eng. 16, 359; {_INC} Eq. (8.62) with the hydraulic "
        "diameter as Section 8.7 allows for turbulent flow (from memory)",
        accuracy="about 10 % for the tube; the hydraulic diameter adds error for sharp corners and "
        "for the inner wall of narrow annuli (from memory)",
        accuracy_pct=20.0,
        notes="not for laminar flow, where the hydraulic diameter fails (use the annulus or "
        "rectangular-duct records)",
        function=_duct_gnielinski_smooth,
    ),
    _r(
        slug="duct-transitional-gnielinski",
        title="Circular duct, transitional flow 2300 < Re < 1e4 (Gnielinski's interpolation)",
        geometry="duct",
        convection="forced",
        regime="transitional",
        length="diameter d",
        boundary="constant wall temperature/concentration",
        inputs=_RP,
        parameters={"d_over_L": 0.0},
        envelope={"Re": (2300.0, 1e4), "Pr": (0.6, 1000.0), "d_over_L": (0.0, 1.0)},
        domain={"d_over_L": (0.0, INF)},
        fitted_on="heat",
        reference="Gnielinski (2013), Int. J. Heat Mass Transfer 63, 134, Eqs. (5)-(7); VDI Heat "
        "Atlas, 2nd ed. (2010), Section G1, Eqs. (12), (26)-(30) (from memory)",
        accuracy="about 15 % against the transitional data (from memory)",
        accuracy_pct=15.0,
        notes="linear in Re between the laminar mean Nu at Re = 2300 and the turbulent one at 1e4, "
        "both for the length L (d_over_L = d/L; 0 for a long tube)",
        function=_duct_transitional,
    ),
    # drops and bubbles ---------------------------------------------------------------------------
    _r(
        slug="drop-creeping-circulating",
        title="Circulating drop in creeping flow, any viscosity ratio, high Peclet number",
        geometry="bubble or drop",
        convection="forced",
        regime="creeping",
        length="drop diameter d",
        boundary=_ISO + ", Hadamard-Rybczynski internal circulation (continuous-phase resistance)",
        inputs=_RP,
        parameters={"viscosity_ratio": None},
        envelope={"Re": (0.0, 1.0), "Pr": (0.0, INF), "viscosity_ratio": (0.0, 2.0)},
        products={"Pe": (("Re", "Pr"), (100.0, INF))},
        fitted_on="both",
        reference="Levich (1962), Physicochemical Hydrodynamics, Section 72; Clift, Grace & Weber "
        "(1978), Bubbles, Drops, and Particles, Eq. (3-47) (from memory)",
        accuracy="thin-boundary-layer theory; within about 10 % for Pe/(1 + viscosity_ratio) >= 100",
        accuracy_pct=10.0,
        notes="viscosity_ratio = drop over continuous-phase viscosity; 0 is the clean bubble "
        "(drop-creeping-mobile); for large ratios the drop behaves as rigid (sphere-creeping-rigid, "
        "sphere-creeping-high-peclet); surfactants immobilise the interface",
        function=_drop_circulating,
    ),
    _r(
        slug="drop-inside-rigid-newman",
        title="Inside a rigid (stagnant) drop, long contact time",
        geometry="bubble or drop",
        convection="interfacial",
        regime="all",
        length="drop diameter d; Sh = k_d d / D_d with the diffusivity inside the drop",
        boundary="constant surface concentration, molecular diffusion inside a sphere",
        inputs=_RP,
        envelope={"Re": (0.0, INF), "Pr": (0.0, INF)},
        fitted_on="both",
        reference="Newman (1931), Trans. AIChE 27, 203; Sh = 2 pi^2/3, the first term of the "
        "sphere series (Crank, The Mathematics of Diffusion, 2nd ed., Eq. (6.20)) (from memory)",
        accuracy="exact for a stagnant sphere once the first term of the series dominates "
        "(Fourier number D_d t / R^2 above about 0.1)",
        accuracy_pct=1.0,
        notes="k_d on the mean concentration inside the drop; shorter contact gives a larger k_d "
        "(use masstransfer.bodies for the transient)",
        function=_const(2.0 * math.pi**2 / 3.0),
    ),
    _r(
        slug="drop-inside-circulating-kronig-brink",
        title="Inside a circulating drop, creeping flow, long contact time (Kronig-Brink)",
        geometry="bubble or drop",
        convection="interfacial",
        regime="creeping",
        length="drop diameter d; Sh = k_d d / D_d with the diffusivity inside the drop",
        boundary="constant surface concentration, Hadamard-Rybczynski circulation inside",
        inputs=_RP,
        envelope={"Re": (0.0, 1.0), "Pr": (0.0, INF)},
        fitted_on="both",
        reference="Kronig & Brink (1950), Appl. Sci. Res. A2, 142; asymptote Sh = 17.66 as quoted in "
        "Clift, Grace & Weber (1978), ch. 3 (from memory)",
        accuracy="theory for a fully circulating drop at large internal Peclet number (from memory)",
        accuracy_pct=10.0,
        notes="about 2.7 times the rigid-drop value; Re here is the drop's (continuous-phase) "
        "Reynolds number, which must be small for Hadamard circulation",
        function=_const(17.66),
    ),
    _r(
        slug="drop-inside-oscillating-handlos-baron",
        title="Inside an oscillating drop, turbulent circulation (Handlos-Baron)",
        geometry="bubble or drop",
        convection="interfacial",
        regime=_TURB,
        length="drop diameter d; Re = U d/nu_d and Sc = nu_d/D_d both of the drop phase, so Re Sc = U d/D_d",
        boundary="dispersed-phase resistance, oscillating drop",
        inputs=_RP,
        parameters={"viscosity_ratio": None},
        envelope={"Re": (0.0, INF), "Pr": (0.0, INF), "viscosity_ratio": (0.0, 10.0)},
        products={"Pe": (("Re", "Pr"), (1e4, INF))},
        fitted_on="mass",
        reference="Handlos & Baron (1957), AIChE J. 3, 127; k_d = 0.00375 U/(1 + mu_d/mu_c), Treybal, "
        "Mass-Transfer Operations, 3rd ed., Section 10 (from memory)",
        accuracy="model; about 30 % (from memory)",
        accuracy_pct=30.0,
        notes="viscosity_ratio = drop over continuous-phase viscosity; only for drops large enough to "
        "oscillate (continuous-phase Re of a few hundred and more), which this record cannot check",
        function=_drop_oscillating,
    ),
    # spheres in liquids ------------------------------------------------------------------------
    _r(
        slug="sphere-creeping-high-peclet",
        title="Rigid sphere in creeping flow, thin boundary layer (Levich; Acrivos-Goddard)",
        geometry="sphere",
        convection="forced",
        regime="creeping",
        length="sphere diameter d",
        boundary=_ISO + ", rigid interface",
        inputs=_RP,
        envelope={"Re": (0.0, 1.0), "Pr": (0.0, INF)},
        products={"Pe": (("Re", "Pr"), (100.0, INF))},
        fitted_on="both",
        reference="Levich (1962), Physicochemical Hydrodynamics, Section 14; Acrivos & Goddard "
        "(1965), J. Fluid Mech. 23, 273, Eq. (4.10) (from memory)",
        accuracy="asymptotic theory; error of order Pe^(-1/3), within about 2 % for Pe >= 100",
        accuracy_pct=2.0,
        notes="particles settling in liquids; Sh = 0.991 Pe^(1/3) + 0.922",
        function=_sph_high_peclet,
    ),
    _r(
        slug="sphere-liquid-clift",
        title="Rigid sphere in a liquid, 1 < Re < 2000 (Clift, Grace & Weber)",
        geometry="sphere",
        convection="forced",
        regime="all",
        length="sphere diameter d",
        boundary=_ISO + ", rigid interface",
        inputs=_RP,
        envelope={"Re": (1.0, 2000.0), "Pr": (10.0, INF)},
        fitted_on="mass",
        reference="Clift, Grace & Weber (1978), Bubbles, Drops, and Particles, Eqs. (5-25)-(5-26) "
        "(from memory)",
        accuracy="about 10 % against numerical solutions and data (from memory)",
        accuracy_pct=10.0,
        notes="thin-concentration-boundary-layer forms for large Sc (liquids); two forms joined at "
        "Re = 100, where they agree within 0.1 %",
        function=_sph_liquid_clift,
    ),
    # rotating bodies -----------------------------------------------------------------------------
    _r(
        slug="rotating-disk-newman",
        title="Rotating disk, laminar, finite Schmidt number (Newman)",
        geometry="rotating disk",
        convection="forced",
        regime=_LAM,
        length="disk radius r",
        boundary="uniformly accessible surface",
        inputs=_RP,
        envelope={"Re": (0.0, 2e5), "Pr": (100.0, INF)},
        fitted_on="both",
        reference="Newman (1966), J. Phys. Chem. 70, 1327, Eq. (14) (from memory)",
        accuracy="three-term series; within about 0.1 % for Sc >= 100 (from memory)",
        accuracy_pct=1.0,
        notes="Re = omega r^2 / nu; Levich's leading term divided by 1 + 0.2980 Sc^(-1/3) + "
        "0.14514 Sc^(-2/3)",
        function=_newman,
    ),
    _r(
        slug="rotating-cylinder-eisenberg-tobias-wilke",
        title="Rotating cylinder in a liquid, turbulent (Eisenberg-Tobias-Wilke)",
        geometry="rotating cylinder",
        convection="forced",
        regime=_TURB,
        length="cylinder diameter d; Re on the peripheral velocity",
        boundary="uniformly accessible cylinder surface",
        inputs=_RP,
        envelope={"Re": (1000.0, 1e5), "Pr": (835.0, 11490.0)},
        fitted_on="mass",
        reference="Eisenberg, Tobias & Wilke (1954), J. Electrochem. Soc. 101, 306; "
        "k/u = 0.0791 Re^-0.30 Sc^-0.644 (from memory)",
        accuracy="about 10 % (from memory)",
        accuracy_pct=10.0,
        notes="electrochemical limiting-current measurements in concentric-cylinder cells",
        function=_rotating_cylinder,
    ),
    # enclosures -----------------------------------------------------------------------------------
    _r(
        slug="enclosure-horizontal-globe-dropkin",
        title="Horizontal enclosure heated from below (Globe-Dropkin)",
        geometry="enclosure",
        convection="free",
        regime=_TURB,
        length="gap L between the hot and cold plates",
        boundary="two horizontal plates at different temperatures/concentrations, lower one hotter",
        inputs=_RAP,
        envelope={"Ra": (3e5, 7e9), "Pr": (0.02, 8750.0)},
        fitted_on="heat",
        reference=f"Globe & Dropkin (1959), J. Heat Transfer 81, 24; {_INC} Eq. (9.49) (from memory)",
        accuracy="about 20 % (from memory)",
        accuracy_pct=20.0,
        notes="below Ra = 1708 the layer is stable and Nu = 1 (pure diffusion across the gap)",
        function=_enclosure_horizontal,
    ),
    _r(
        slug="enclosure-vertical-catton",
        title="Vertical rectangular enclosure, 2 < H/L < 10 (Catton)",
        geometry="enclosure",
        convection="free",
        regime="all",
        length="gap L between the hot and cold walls",
        boundary="two vertical walls at different temperatures/concentrations, the others insulated",
        inputs=_RAP,
        parameters={"H_over_L": None},
        envelope={"Ra": (1e3, 1e10), "Pr": (0.0, 1e5), "H_over_L": (2.0, 10.0)},
        domain={"H_over_L": (1e-6, INF)},
        fitted_on="heat",
        reference=f"Catton (1978), Proc. 6th Int. Heat Transfer Conf. 6, 13; {_INC} Eq. (9.50) (from memory)",
        accuracy="about 20 % (from memory)",
        accuracy_pct=20.0,
        notes="H_over_L = enclosure height over gap",
        function=_enclosure_catton_tall,
    ),
    _r(
        slug="enclosure-vertical-catton-square",
        title="Vertical rectangular enclosure, 1 < H/L < 2 (Catton)",
        geometry="enclosure",
        convection="free",
        regime="all",
        length="gap L between the hot and cold walls",
        boundary="two vertical walls at different temperatures/concentrations, the others insulated",
        inputs=_RAP,
        envelope={"Ra": (1e3, 1e10), "Pr": (1e-3, 1e5)},
        fitted_on="heat",
        reference=f"Catton (1978), Proc. 6th Int. Heat Transfer Conf. 6, 13; {_INC} Eq. (9.51) (from memory)",
        accuracy="about 20 % (from memory)",
        accuracy_pct=20.0,
        notes="1 < H/L < 2; the source asks Ra Pr/(0.2 + Pr) >= 1e3",
        function=_enclosure_catton_square,
    ),
    _r(
        slug="enclosure-vertical-macgregor-emery",
        title="Tall vertical enclosure, 10 < H/L < 40 (MacGregor-Emery)",
        geometry="enclosure",
        convection="free",
        regime="all",
        length="gap L between the hot and cold walls",
        boundary="two vertical walls at different temperatures/concentrations, the others insulated",
        inputs=_RAP,
        parameters={"H_over_L": None},
        envelope={"Ra": (1e4, 1e7), "Pr": (1.0, 2e4), "H_over_L": (10.0, 40.0)},
        domain={"H_over_L": (1e-6, INF)},
        fitted_on="heat",
        reference=f"MacGregor & Emery (1969), J. Heat Transfer 91, 391; {_INC} Eq. (9.52) (from memory)",
        accuracy="about 20 % (from memory)",
        accuracy_pct=20.0,
        notes="H_over_L = enclosure height over gap",
        function=_enclosure_macgregor_emery,
    ),
    # mixed convection ------------------------------------------------------------------------------
    _r(
        slug="vertical-plate-mixed-churchill",
        title="Vertical plate, mixed forced and free convection, assisting flow (Churchill's rule)",
        geometry="vertical plate",
        convection="mixed",
        regime=_LAM,
        length="plate height L (along the flow)",
        boundary=_ISO,
        inputs=("Re", "Pr", "Ra"),
        envelope={"Re": (0.0, 5e5), "Pr": (0.6, INF), "Ra": (0.1, 1e12)},
        fitted_on="heat",
        reference=f"Churchill (1977), AIChE J. 23, 10; {_INC} Eq. (9.56) with n = 3, forced part "
        "Eq. (7.30), free part Eq. (9.26) (from memory)",
        accuracy="about 20 % (from memory)",
        accuracy_pct=20.0,
        notes="Nu^3 = Nu_forced^3 + Nu_free^3, for buoyancy assisting (or transverse to) the forced "
        "flow; opposing flow (minus sign) is not covered",
        function=_vp_mixed,
    ),
)
