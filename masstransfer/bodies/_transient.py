r"""Transient diffusion: uptake and release by slabs, cylinders and spheres; semi-infinite media.

The solutions are those of Crank, *The Mathematics of Diffusion*, 2nd ed.
(1975), for constant D, an initially uniform body and a step in the
surrounding concentration, with or without a surface (film) resistance
expressed by the mass Biot number :math:`Bi = k\,a/(K D)`.  Sizes: the
half-thickness for a slab exposed on both faces, the radius for a cylinder
or sphere.

Every series is summed until its first neglected term is below
:data:`SERIES_TOLERANCE` at every requested time; at short times, where the
series converge slowly, the short-time (error-function) expansions are used
instead.  Everything is vectorised over t.
"""

from __future__ import annotations

import functools
import math
from collections.abc import Callable
from dataclasses import dataclass
from typing import Any, Final, overload

import numpy as np
from scipy import special

from .._frozen import FrozenResult
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import (
    check_finite,
    check_nonnegative,
    check_positive,
    check_shapes,
    finish,
    guard,
    scalar,
)
from ..errors import InputTypeError, InputValueError, UnknownMethodError

__all__ = [
    "SERIES_TOLERANCE",
    "SHAPES",
    "DiffusivityFit",
    "concentration_profile",
    "fit_diffusivity",
    "fractional_release",
    "fractional_uptake",
    "half_time",
    "semi_infinite_concentration",
    "semi_infinite_uptake",
]

#: Absolute tolerance on M_t/M_inf (and on c/c_s) of every series sum.
SERIES_TOLERANCE: Final = 1e-12
#: Accepted shapes; size is the half-thickness (slab) or the radius.
SHAPES: Final = ("slab", "cylinder", "sphere")
#: Below this Dt/a^2 the short-time expansions replace the series (constant surface).
_SHORT_TIME: Final = {"slab": 0.05, "cylinder": 0.01, "sphere": 0.05}
#: Most series terms ever used; beyond it the short-time forms take over.
_MAX_TERMS: Final = 20000


def _biot(biot: Any) -> float | None:
    """Validate a mass Biot number: None (no surface resistance) or one finite, positive number."""
    if biot is None:
        return None
    bi = scalar("biot", biot)
    return float(check_positive("biot", bi, "pass a positive Biot number, or None for no surface resistance"))


def _shape(shape: str) -> str:
    if not isinstance(shape, str):
        raise InputTypeError(f"shape={shape!r} is a {type(shape).__name__}; pass one of {', '.join(SHAPES)}")
    if shape.lower() not in SHAPES:
        raise UnknownMethodError(f"shape={shape!r} is not one of {', '.join(SHAPES)}; choose one of them")
    return shape.lower()


def _ierfc(x: Any) -> Any:
    """Integral of the complementary error function, exp(-x^2)/sqrt(pi) - x erfc(x).

    Zero (below 1e-300) beyond x = 26, where x^2 would overflow for extreme arguments.
    """
    xc = np.minimum(x, 26.0)
    return np.where(x > 26.0, 0.0, np.exp(-xc * xc) / math.sqrt(math.pi) - xc * special.erfc(xc))


def _n_terms(T_min: float, decay: float) -> int:
    """Terms needed so that exp(-decay * n^2 * T_min) < tolerance for the first neglected n."""
    if T_min <= 0:
        return _MAX_TERMS
    n = math.sqrt(math.log(1.0 / SERIES_TOLERANCE) / (decay * T_min)) + 2
    return _MAX_TERMS if not n < _MAX_TERMS else math.ceil(n)  # also when n overflowed to inf


def _chunked_sum(n_terms: int, term: Any, size: int, chunk: int = 64) -> FloatArray:
    """Sum term(k_slice) over k = 0..n_terms-1 in chunks, so memory stays chunk x size."""
    total = np.zeros(size)
    for start in range(0, n_terms, chunk):
        total += np.sum(term(slice(start, min(start + chunk, n_terms))), axis=0)
    return total


@functools.lru_cache(maxsize=1)
def _cylinder_short_coefficients(n: int = 14) -> FloatArray:
    """Coefficients c_k of M/M_inf = sum c_k T^((k+1)/2) for a cylinder at short times.

    From the Laplace transform of the uptake, (2/(a q p)) I1(qa)/I0(qa), with the
    large-argument expansions of I0 and I1 divided term by term and inverted
    with L^-1[p^-v] = t^(v-1)/Gamma(v); the first three terms are Crank's (5.24).
    """

    def bessel_asymptotic(nu: float) -> FloatArray:
        a = np.zeros(n)
        for k in range(n):
            prod = 1.0
            for j in range(1, k + 1):
                prod *= 4 * nu * nu - (2 * j - 1) ** 2
            a[k] = (-1) ** k * prod / (math.factorial(k) * 8.0**k)
        return a

    num, den = bessel_asymptotic(1.0), bessel_asymptotic(0.0)
    r = np.zeros(n)
    for k in range(n):  # series division num/den in powers of 1/z
        r[k] = (num[k] - sum(r[j] * den[k - j] for j in range(k))) / den[0]
    return np.array([2 * r[k] / math.gamma(1 + (k + 1) / 2) for k in range(n)])


# --- eigenvalues ---------------------------------------------------------------------


@functools.lru_cache(maxsize=64)
def _roots(shape: str, biot: float, n: int) -> FloatArray:
    """First n positive eigenvalues beta_n for a surface-resistance problem (vectorised bisection)."""
    k = np.arange(1, n + 1, dtype=float)
    if shape == "slab":  # beta tan beta = Bi  ->  beta sin beta - Bi cos beta = 0
        lo, hi = (k - 1) * np.pi, (k - 0.5) * np.pi

        def f(b: FloatArray) -> FloatArray:
            return np.asarray(b * np.sin(b) - biot * np.cos(b))

    elif shape == "sphere":  # beta cot beta = 1 - Bi  ->  beta cos beta - (1 - Bi) sin beta = 0
        lo, hi = (k - 1) * np.pi, k * np.pi
        lo[0] = 1e-12

        def f(b: FloatArray) -> FloatArray:
            return np.asarray(b * np.cos(b) - (1.0 - biot) * np.sin(b))

    else:  # cylinder: beta J1(beta) = Bi J0(beta); roots between zeros of J1 (with 0) and of J0
        j1 = np.concatenate(([1e-12], special.jn_zeros(1, n - 1))) if n > 1 else np.array([1e-12])
        lo, hi = j1, special.jn_zeros(0, n)

        def f(b: FloatArray) -> FloatArray:
            return np.asarray(b * special.j1(b) - biot * special.j0(b))

    f_lo = f(lo)
    for _ in range(80):
        mid = 0.5 * (lo + hi)
        f_mid = f(mid)
        same = np.sign(f_mid) == np.sign(f_lo)
        lo = np.where(same, mid, lo)
        f_lo = np.where(same, f_mid, f_lo)
        hi = np.where(same, hi, mid)
    return np.asarray(0.5 * (lo + hi))


# --- uptake ------------------------------------------------------------------------------


def _uptake_constant_surface(shape: str, T: FloatArray) -> FloatArray:
    out = np.empty_like(T)
    short = _SHORT_TIME[shape] > T
    Ts, Tl = T[short], T[~short]
    if Ts.size:
        rt = np.sqrt(Ts)
        if shape == "slab":  # Crank (4.20): 2 sqrt(T)[1/sqrt(pi) + 2 sum (-1)^n ierfc(n/sqrt T)]
            s = np.zeros_like(Ts)
            for n in range(1, 8):
                s += (-1) ** n * _ierfc(n / rt)
            out[short] = 2 * rt * (1 / math.sqrt(math.pi) + 2 * s)
        elif shape == "sphere":  # Crank (6.21)
            s = np.zeros_like(Ts)
            for n in range(1, 8):
                s += _ierfc(n / rt)
            out[short] = 6 * rt * (1 / math.sqrt(math.pi) + 2 * s) - 3 * Ts
        else:  # cylinder: the short-time expansion of the Laplace solution (Crank 5.24 extended)
            c = _cylinder_short_coefficients()
            acc = np.zeros_like(Ts)
            for k in range(c.size - 1, -1, -1):  # Horner in sqrt(T)
                acc = acc * rt + c[k]
            out[short] = acc * rt
    if Tl.size:
        T0 = float(Tl.min())
        if shape == "slab":  # Crank (4.18): 1 - sum 8/((2n+1)^2 pi^2) exp(-(2n+1)^2 pi^2 T / 4)
            N = _n_terms(T0, math.pi**2 / 4)
            m = 2 * np.arange(N)[:, None] + 1.0

            def term(k: slice) -> FloatArray:
                return np.asarray(8 / (m[k] ** 2 * np.pi**2) * np.exp(-(m[k] ** 2) * np.pi**2 * Tl / 4))

        elif shape == "sphere":  # Crank (6.20)
            N = _n_terms(T0, math.pi**2)
            m = np.arange(1, N + 1)[:, None].astype(float)

            def term(k: slice) -> FloatArray:
                return np.asarray(6 / (m[k] ** 2 * np.pi**2) * np.exp(-(m[k] ** 2) * np.pi**2 * Tl))

        else:  # Crank (5.23): alpha_n zeros of J0
            N = _n_terms(T0, 5.0)
            al = special.jn_zeros(0, N)[:, None]

            def term(k: slice) -> FloatArray:
                return np.asarray(4 / al[k] ** 2 * np.exp(-(al[k] ** 2) * Tl))

        out[~short] = 1 - _chunked_sum(N, term, Tl.size)
    return out


def _uptake_surface_resistance(shape: str, T: FloatArray, biot: float) -> FloatArray:
    out = np.empty_like(T)
    tiny = T < _TINY_TIME
    if tiny.any():  # a plane surface with resistance, x = Bi sqrt(T); series where x is small
        x = biot * np.sqrt(T[tiny])
        nu = {"slab": 1.0, "cylinder": 2.0, "sphere": 3.0}[shape]
        planar = np.where(
            x < 1e-3,
            x * x - 4 * x**3 / (3 * math.sqrt(math.pi)) + x**4 / 2,
            special.erfcx(np.maximum(x, 1e-3)) - 1 + 2 * x / math.sqrt(math.pi),
        )
        out[tiny] = nu * planar / biot
    short = (T < _PROFILE_SHORT_TIME) & ~tiny
    if short.any():  # exact transform inverted numerically: no cancellation at tiny times
        out[short] = _talbot(lambda s, rows: _laplace_uptake(shape, s, biot), T[short])
    if not (short | tiny).all():
        short = short | tiny
        out[~short] = _uptake_surface_resistance_series(shape, T[~short], biot)
    return out


def _uptake_surface_resistance_series(shape: str, T: FloatArray, biot: float) -> FloatArray:
    out = np.empty_like(T)
    L = biot
    short = np.zeros(T.shape, dtype=bool)
    if shape == "slab":
        # semi-infinite with surface resistance on each face; the finite slab differs by terms of
        # order erfc(1/sqrt(T)), below the tolerance for T < 0.01
        short = T < 0.01
        Ts = T[short]
        if Ts.size:
            x = L * np.sqrt(Ts)
            out[short] = (special.erfcx(x) - 1 + 2 * x / math.sqrt(math.pi)) / L
    Tl = T[~short]
    if Tl.size:
        T0 = float(Tl.min())
        N = max(_n_terms(T0, math.pi**2 / 4), 4)
        b = _roots(shape, L, N)[:, None]
        if shape == "slab":  # Crank (4.55)
            coef = 2 * L**2 / (b**2 * (b**2 + L**2 + L))
        elif shape == "cylinder":  # Crank (5.51)
            coef = 4 * L**2 / (b**2 * (b**2 + L**2))
        else:  # Crank (6.40)
            coef = 6 * L**2 / (b**2 * (b**2 + L * (L - 1)))

        def term(k: slice) -> FloatArray:
            return np.asarray(coef[k] * np.exp(-(b[k] ** 2) * Tl))

        vals = 1 - _chunked_sum(N, term, Tl.size)
        if N >= _MAX_TERMS:
            # series truncated (Dt/a^2 below about 1e-8): leading planar short-time form scaled by
            # the area-to-volume ratio; its relative error there is of order sqrt(Dt/a^2)
            ratio = {"slab": 1.0, "cylinder": 2.0, "sphere": 3.0}[shape]
            x = L * np.sqrt(Tl)
            planar = (special.erfcx(x) - 1 + 2 * x / math.sqrt(math.pi)) / L * ratio
            tail = np.exp(-(float(b[-1, 0]) ** 2) * Tl) > SERIES_TOLERANCE
            vals = np.where(tail, planar, vals)
        out[~short] = vals
    return out


@overload
def fractional_uptake(shape: str, t: float, D: float, size: float, biot: float | None = ...) -> float: ...
@overload
def fractional_uptake(
    shape: str, t: FloatArray, D: ArrayLike, size: ArrayLike, biot: float | None = ...
) -> FloatArray: ...
@overload
def fractional_uptake(
    shape: str, t: ArrayLike, D: ArrayLike, size: ArrayLike, biot: ArrayLike | None = ...
) -> FloatOrArray: ...
@guard
def fractional_uptake(
    shape: str, t: ArrayLike, D: ArrayLike, size: ArrayLike, biot: ArrayLike | None = None
) -> FloatOrArray:
    r"""Fraction of the equilibrium uptake reached after time t, :math:`M_t/M_\infty`.

    For a body initially at a uniform concentration whose surroundings step
    to a new constant concentration at t = 0.

    Parameters
    ----------
    shape : {'slab', 'cylinder', 'sphere'}
        Body shape; a slab is exposed on both faces (a sheet sealed on one
        face behaves as a slab of twice its thickness).
    t : float or array_like
        Time since the step [s] (zero or more).
    D : float or array_like
        Diffusivity in the body [m^2/s].
    size : float or array_like
        Half-thickness (slab) or radius (cylinder, sphere) [m].
    biot : float, optional
        Mass Biot number :math:`k\,a/(K D)` [-] for a finite surface
        resistance (k the external coefficient, K the partition coefficient
        body/fluid); None or inf for a surface at equilibrium.

    Returns
    -------
    float or numpy.ndarray
        :math:`M_t/M_\infty` [-], from 0 to 1.

    Notes
    -----
    Series summed to an absolute tolerance of :data:`SERIES_TOLERANCE`;
    short-time expansions below Dt/a^2 of 0.05 (slab, sphere) or 0.01
    (cylinder), where they agree with the series to better than 1e-9.
    With a surface resistance the series is used at all times (up to 20000
    terms; for the slab the exact semi-infinite form below Dt/a^2 = 0.01);
    for curved bodies below Dt/a^2 of about 1e-8 the planar short-time form
    is used, with a relative error of order (Dt/a^2)^(1/2).  The
    same fraction describes release (desorption) by the linearity of the
    equations (:func:`fractional_release`).  Constant D only: for
    concentration-dependent D (many polymer-solvent pairs) treat the result
    as an estimate with an effective D.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Oxford,
    Eqs. (4.18), (4.20), (4.55), (5.23), (5.24), (5.51), (6.20), (6.21),
    (6.40).

    Examples
    --------
    >>> round(fractional_uptake("slab", 3600.0, 1e-11, 0.5e-3), 4)
    0.4281

    """
    s = _shape(shape)
    tv = check_nonnegative("t", t, "pass a time of zero or more [s]")
    Dv = check_positive("D", D)
    a = check_positive("size", size)
    check_shapes(t=tv, D=Dv, size=a)
    T = np.atleast_1d(np.asarray(tv * Dv / (a * a), dtype=float))
    shape_out = np.shape(tv * Dv / (a * a))
    flat = T.ravel()
    out = np.zeros_like(flat)
    pos = flat > 0
    bi = _biot(biot)
    if bi is None:
        out[pos] = _uptake_constant_surface(s, flat[pos])
    else:
        out[pos] = _uptake_surface_resistance(s, flat[pos], bi)
    out = np.clip(out, 0.0, 1.0)
    return finish(out.reshape(shape_out))


@guard
def fractional_release(
    shape: str, t: ArrayLike, D: ArrayLike, size: ArrayLike, biot: ArrayLike | None = None
) -> FloatOrArray:
    """Fraction of the releasable amount lost after time t (desorption).

    Parameters
    ----------
    shape : {'slab', 'cylinder', 'sphere'}
        Body shape.
    t : float or array_like
        Time since the step [s].
    D : float or array_like
        Diffusivity in the body [m^2/s].
    size : float or array_like
        Half-thickness (slab) or radius [m].
    biot : float, optional
        Mass Biot number [-].

    Returns
    -------
    float or numpy.ndarray
        Fraction released [-], equal to :func:`fractional_uptake` for the
        same body and conditions (linear problem, constant D).

    Notes
    -----
    Sorption and desorption curves coincide only for constant D; a
    measured difference between them indicates concentration-dependent D.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Section 9.3.

    Examples
    --------
    >>> fractional_release("sphere", 100.0, 1e-10, 1e-3) == fractional_uptake("sphere", 100.0, 1e-10, 1e-3)
    True

    """
    return fractional_uptake(shape, t, D, size, biot)


@guard
def concentration_profile(
    shape: str,
    position: ArrayLike,
    t: ArrayLike,
    D: float,
    size: float,
    biot: float | None = None,
) -> FloatOrArray:
    """Dimensionless concentration :math:`(c - c_0)/(c_s - c_0)` inside the body.

    Parameters
    ----------
    shape : {'slab', 'cylinder', 'sphere'}
        Body shape.
    position : float or array_like
        Distance from the centre (slab: from the mid-plane), 0 to size [m].
    t : float or array_like
        Time since the step [s]; broadcasts against position.
    D : float
        Diffusivity [m^2/s].
    size : float
        Half-thickness or radius [m].
    biot : float, optional
        Mass Biot number [-]; None for a surface at equilibrium.

    Returns
    -------
    float or numpy.ndarray
        Scaled concentration [-]: 0 at the initial state, 1 at equilibrium with the surroundings; for
        release, 1 minus this is the remaining fraction of the initial
        excess.

    Notes
    -----
    At Dt/a^2 >= 1e-3 the series are summed to :data:`SERIES_TOLERANCE`.
    Below, the exact Laplace-domain solution is inverted on the fixed
    Talbot contour (24 nodes; agrees with the converged series to about
    1e-13), evaluated only within 16 penetration depths of the surface and
    zero deeper in, so very short times cost little and stay exact.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Eqs. (4.17),
    (4.53), (5.22), (5.50), (6.18), (6.39).

    Abate, J. & Valkó, P. P. (2004). Multi-precision Laplace transform
    inversion. *Int. J. Numer. Meth. Eng.* 60, 979-993 (the fixed Talbot
    method).

    Examples
    --------
    >>> round(concentration_profile("slab", 0.0, 3600.0, 1e-11, 0.5e-3), 4)
    0.1248

    """
    s = _shape(shape)
    x = check_nonnegative("position", position)
    tv = check_nonnegative("t", t)
    Dv = float(check_positive("D", scalar("D", D)))
    a = float(check_positive("size", scalar("size", size)))
    check_shapes(position=x, t=tv)
    if np.any(np.asarray(x) > a * (1 + 1e-12)):
        raise InputValueError(f"position must lie between 0 and size={a!r} (centre to surface)")
    X, Tt = np.broadcast_arrays(np.asarray(x, dtype=float) / a, np.asarray(tv, dtype=float) * Dv / a**2)
    Xf, Tf = X.ravel(), Tt.ravel()
    out = np.zeros_like(Xf)
    bi = _biot(biot)
    series = Tf >= _PROFILE_SHORT_TIME
    if series.any():
        out[series] = _profile(s, Xf[series], Tf[series], bi)
    # Short times: the exact Laplace-domain solution inverted numerically, only where the
    # concentration is not negligible (within 16 penetration depths sqrt(Dt) of the surface).
    near = (Tf > 0) & ~series & (1.0 - Xf < 16.0 * np.sqrt(Tf))
    tiny = near & (Tf < _TINY_TIME)
    if tiny.any():  # the plane semi-infinite solution (Carslaw & Jaeger 1959, sec. 2.7)
        xi = (1.0 - Xf[tiny]) / (2.0 * np.sqrt(Tf[tiny]))
        plane = special.erfc(xi)
        if bi is not None:
            plane = plane - np.exp(-xi * xi) * special.erfcx(xi + bi * np.sqrt(Tf[tiny]))
        out[tiny] = plane
    short = near & ~tiny
    if short.any():
        out[short] = _talbot_profile(s, Xf[short], Tf[short], bi)
    return finish(np.clip(out, 0.0, 1.0).reshape(X.shape))


#: Below this Dt/a^2 the profile is obtained by inverting its Laplace transform (the series
#: would need more than a few hundred terms and resolve the thin penetration layer poorly).
_PROFILE_SHORT_TIME: Final = 1e-3
#: Below this Dt/a^2 the penetration depth is under 1e-7 of the size: the plane semi-infinite
#: forms hold to a relative 1e-7 (curvature) and far inside the absolute series tolerance; the
#: Talbot nodes would also need Bessel functions of complex arguments near 1e10 in modulus.
_TINY_TIME: Final = 1e-14
#: Terms of the fixed Talbot contour; 24 gives about 1e-13 against the converged series.
_TALBOT_TERMS: Final = 24


def _surface_ratio_and_gradient(shape: str, X: Any, q: Any) -> tuple[Any, Any]:
    """c(X)/c(1) and g(q) = (dc/dX)/c at X = 1 of the constant-surface transform, q = sqrt(s).

    cosh(Xq)/cosh q and q tanh q (slab), I0(Xq)/I0(q) and q I1(q)/I0(q) (cylinder),
    sinh(Xq)/(X sinh q) and q coth q - 1 (sphere); written with decaying exponentials and the
    exponentially scaled Bessel functions so that nothing overflows at large |s|.
    """
    e2 = np.exp(-2 * q)
    if shape == "slab":
        ratio = np.exp((X - 1) * q) * (1 + np.exp(-2 * X * q)) / (1 + e2)
        return ratio, q * (1 - e2) / (1 + e2)
    if shape == "sphere":
        Xs = np.maximum(X, 1e-9)
        core = np.exp((Xs - 1) * q) * (1 - np.exp(-2 * Xs * q)) / (Xs * (1 - e2))
        centre = 2 * q * np.exp(-q) / (1 - e2)
        return np.where(X < 1e-9, centre, core), q * (1 + e2) / (1 - e2) - 1
    i0 = special.ive(0, q)
    return special.ive(0, X * q) / i0 * np.exp((X - 1) * q.real), q * special.ive(1, q) / i0


def _laplace_profile(shape: str, X: Any, s: Any, biot: float | None) -> Any:
    """Laplace transform in T = Dt/a^2 of c/c_s at X = r/a, at complex s (Crank, ch. 2-6).

    Constant surface: the ratio of :func:`_surface_ratio_and_gradient` over s.  With a surface
    resistance the transform is multiplied by Bi / (g(q) + Bi).
    """
    ratio, grad = _surface_ratio_and_gradient(shape, X, np.sqrt(s))
    if biot is None:
        return ratio / s
    return biot * ratio / (s * (grad + biot))


def _laplace_uptake(shape: str, s: Any, biot: float | None) -> Any:
    """Laplace transform in T of M_t/M_inf: nu g(q) c_surface(s)/s, nu = 1, 2, 3 by shape."""
    _, grad = _surface_ratio_and_gradient(shape, 1.0, np.sqrt(s))
    nu = {"slab": 1.0, "cylinder": 2.0, "sphere": 3.0}[shape]
    if biot is None:
        return nu * grad / s**2
    return nu * grad * biot / (s**2 * (grad + biot))


def _talbot(F: Callable[[Any, slice], Any], T: FloatArray) -> FloatArray:
    """Invert a Laplace transform at every T on the fixed Talbot contour (Abate & Valko 2004).

    ``F(s, rows)`` evaluates the transform for the rows ``rows`` of T at s of shape (rows, nodes).
    """
    M = _TALBOT_TERMS
    k = np.arange(1, M)
    theta = k * np.pi / M
    cot = np.cos(theta) / np.sin(theta)
    r = 2.0 * M / 5.0
    delta = np.concatenate(([r + 0j], r * theta * (cot + 1j)))
    gamma = np.concatenate(
        ([0.5 * np.exp(r) + 0j], (1 + 1j * theta * (1 + cot**2) - 1j * cot) * np.exp(delta[1:]))
    )
    out = np.empty_like(T)
    for start in range(0, T.size, 4096):  # blocks keep the complex temporaries small
        sl = slice(start, start + 4096)
        Fs = F(delta[None, :] / T[sl, None], sl)
        out[sl] = (r / M) * np.sum((gamma[None, :] * Fs).real, axis=1) / T[sl]
    return out


def _talbot_profile(shape: str, X: FloatArray, T: FloatArray, biot: float | None) -> FloatArray:
    """Return the concentration profile at short times by :func:`_talbot`."""
    return _talbot(lambda s, rows: _laplace_profile(shape, X[rows, None], s, biot), T)


def _profile(shape: str, X: FloatArray, T: FloatArray, biot: float | None) -> FloatArray:
    T0 = float(T.min())
    size = X.size
    if biot is None:
        if shape == "slab":
            if _SHORT_TIME["slab"] > T0:
                # Crank (4.16): image erfc terms, rapidly convergent at short times
                rt = 2 * np.sqrt(T)
                c = np.zeros_like(T)
                for n in range(0, 8):
                    c += (-1) ** n * (
                        special.erfc(((2 * n + 1) - X) / rt) + special.erfc(((2 * n + 1) + X) / rt)
                    )
                long_ = _SHORT_TIME["slab"] <= T
                if long_.any():
                    c[long_] = _profile("slab", X[long_], T[long_], None)
                return c
            N = _n_terms(T0, math.pi**2 / 4)
            m = 2 * np.arange(N)[:, None] + 1.0
            sign = np.where(np.arange(N) % 2 == 0, 1.0, -1.0)[:, None]

            def slab_term(k: slice) -> FloatArray:  # Crank (4.17)
                mk = m[k]
                return np.asarray(
                    4
                    * sign[k]
                    / (mk * np.pi)
                    * np.cos(mk * np.pi * X / 2)
                    * np.exp(-(mk**2) * np.pi**2 * T / 4)
                )

            return np.asarray(1 - _chunked_sum(N, slab_term, size))
        if shape == "sphere":  # Crank (6.18)
            N = _n_terms(T0, math.pi**2)
            nn = np.arange(1, N + 1)[:, None].astype(float)
            sgn = np.where(np.arange(1, N + 1) % 2 == 0, 1.0, -1.0)[:, None]
            Xs = np.maximum(X, 1e-12)

            def sph_term(k: slice) -> FloatArray:
                nk = nn[k]
                return np.asarray(sgn[k] / nk * np.sin(nk * np.pi * Xs) * np.exp(-(nk**2) * np.pi**2 * T))

            def sph_centre(k: slice) -> FloatArray:
                return np.asarray(sgn[k] * np.exp(-(nn[k] ** 2) * np.pi**2 * T))

            core = 1 + 2 / (np.pi * Xs) * _chunked_sum(N, sph_term, size)
            centre = 1 + 2 * _chunked_sum(N, sph_centre, size)
            return np.asarray(np.where(X < 1e-9, centre, core))
        N = _n_terms(T0, 5.0)  # cylinder, Crank (5.22)
        al = special.jn_zeros(0, N)[:, None]

        def cyl_term(k: slice) -> FloatArray:
            a = al[k]
            return np.asarray(np.exp(-(a**2) * T) * special.j0(a * X) / (a * special.j1(a)))

        return np.asarray(1 - 2 * _chunked_sum(N, cyl_term, size))
    L = float(biot)
    N = max(_n_terms(T0, math.pi**2 / 4), 4)
    b = _roots(shape, L, N)[:, None]
    if shape == "slab":  # Crank (4.53)

        def slab_b(k: slice) -> FloatArray:
            bk = b[k]
            return np.asarray(
                2 * L * np.cos(bk * X) * np.exp(-(bk**2) * T) / ((bk**2 + L**2 + L) * np.cos(bk))
            )

        return np.asarray(1 - _chunked_sum(N, slab_b, size))
    if shape == "cylinder":  # Crank (5.50)

        def cyl_b(k: slice) -> FloatArray:
            bk = b[k]
            return np.asarray(
                2 * L * special.j0(bk * X) * np.exp(-(bk**2) * T) / ((bk**2 + L**2) * special.j0(bk))
            )

        return np.asarray(1 - _chunked_sum(N, cyl_b, size))
    Xs = np.maximum(X, 1e-12)  # sphere, Crank (6.39)

    def sph_b(k: slice) -> FloatArray:
        bk = b[k]
        return np.asarray(np.exp(-(bk**2) * T) * np.sin(bk * Xs) / ((bk**2 + L * (L - 1)) * np.sin(bk)))

    def centre_term(k: slice) -> FloatArray:
        bk = b[k]
        return np.asarray(np.exp(-(bk**2) * T) * bk / ((bk**2 + L * (L - 1)) * np.sin(bk)))

    core = 1 - 2 * L / Xs * _chunked_sum(N, sph_b, size)
    centre = 1 - 2 * L * _chunked_sum(N, centre_term, size)
    return np.asarray(np.where(X < 1e-9, centre, core))


# --- semi-infinite medium -------------------------------------------------------------------


@guard
def semi_infinite_concentration(
    x: ArrayLike,
    t: ArrayLike,
    D: ArrayLike,
    c_surface: ArrayLike,
    c_initial: ArrayLike = 0.0,
    k: ArrayLike | None = None,
) -> FloatOrArray:
    r"""Concentration in a semi-infinite medium after a step at its surface.

    Constant surface concentration:

    .. math:: \frac{c - c_i}{c_s - c_i} = \operatorname{erfc}\frac{x}{2\sqrt{Dt}}

    with a surface resistance (external coefficient k, h = k/D):

    .. math:: \frac{c - c_i}{c_s - c_i} = \operatorname{erfc}\eta
        - e^{hx + h^2Dt}\operatorname{erfc}\left(\eta + h\sqrt{Dt}\right)

    Parameters
    ----------
    x : float or array_like
        Depth below the surface [m].
    t : float or array_like
        Time since the step [s].
    D : float or array_like
        Diffusivity [m^2/s].
    c_surface : float or array_like
        Surface concentration (constant), or the concentration in
        equilibrium with the surroundings when k is given [any unit].
    c_initial : float or array_like
        Initial uniform concentration [same unit].
    k : float, optional
        External mass-transfer coefficient on the medium's concentration
        scale [m/s].

    Returns
    -------
    float or numpy.ndarray
        Concentration [unit of c_surface].

    Notes
    -----
    The product in the resistance form is evaluated as
    :math:`e^{-\eta^2}\operatorname{erfcx}(\eta + h\sqrt{Dt})`, which
    cannot overflow.  Also serves for carburising, drying skins and any
    body much thicker than its penetration depth :math:`\sqrt{Dt}`.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Eqs. (2.45),
    (3.35) (from memory).

    Callister, W. D. (2007). *Materials Science and Engineering*, 7th ed.,
    Eq. (5.5).

    Examples
    --------
    >>> round(semi_infinite_concentration(0.5e-3, 7.06 * 3600, 1.6e-11, 1.20, 0.25), 3)
    0.8

    """
    xv = check_nonnegative("x", x)
    tv = check_nonnegative("t", t)
    Dv = check_positive("D", D)
    cs = check_finite("c_surface", c_surface)
    ci = check_finite("c_initial", c_initial)
    check_shapes(x=xv, t=tv, D=Dv, c_surface=cs, c_initial=ci)
    for name, v in (("c_surface", cs), ("c_initial", ci)):
        if not np.all(np.isfinite(v)):
            raise InputValueError(f"{name} is not finite; pass finite concentrations")
    rt = np.sqrt(np.asarray(Dv * tv, dtype=float))
    with np.errstate(divide="ignore", invalid="ignore"):
        eta = np.where(rt > 0, np.asarray(xv) / (2 * np.where(rt > 0, rt, 1.0)), np.inf)
    theta = special.erfc(eta)
    if k is not None:
        kv = check_positive("k", k)
        h = np.asarray(kv) / np.asarray(Dv)
        theta = theta - np.exp(-(eta**2)) * special.erfcx(eta + h * rt)
        theta = np.where(np.isinf(eta), 0.0, theta)
    theta = np.where(np.asarray(xv) == 0, np.where(rt > 0, theta, 0.0 if k is not None else 1.0), theta)
    return finish(np.asarray(ci) + (np.asarray(cs) - np.asarray(ci)) * theta)


@guard
def semi_infinite_uptake(
    t: ArrayLike,
    D: ArrayLike,
    c_surface: ArrayLike,
    c_initial: ArrayLike = 0.0,
    k: ArrayLike | None = None,
) -> FloatOrArray:
    r"""Amount taken up per unit area by a semi-infinite medium.

    .. math:: M_t = 2(c_s - c_i)\sqrt{Dt/\pi}

    or, with a surface resistance (h = k/D),

    .. math:: M_t = \frac{c_s - c_i}{h}\left[e^{h^2Dt}\operatorname{erfc}(h\sqrt{Dt})
        - 1 + 2h\sqrt{Dt/\pi}\right]

    Parameters
    ----------
    t : float or array_like
        Time [s].
    D : float or array_like
        Diffusivity [m^2/s].
    c_surface : float or array_like
        Surface (or equilibrium) concentration [mol/m^3].
    c_initial : float or array_like
        Initial concentration [mol/m^3].
    k : float, optional
        External coefficient [m/s].

    Returns
    -------
    float or numpy.ndarray
        Amount per unit area [mol/m^2] (negative for release).

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Section 3.3
    (from memory).

    Examples
    --------
    >>> round(semi_infinite_uptake(3600.0, 1e-11, 100.0) * 1e3, 4)
    21.4095

    """
    tv = check_nonnegative("t", t)
    Dv = check_positive("D", D)
    cs = check_finite("c_surface", c_surface)
    ci = check_finite("c_initial", c_initial)
    check_shapes(t=tv, D=Dv, c_surface=cs, c_initial=ci)
    rt = np.sqrt(np.asarray(Dv * tv, dtype=float))
    dc = np.asarray(cs) - np.asarray(ci)
    if k is None:
        return finish(2 * dc * rt / math.sqrt(math.pi))
    kv = check_positive("k", k)
    h = np.asarray(kv) / np.asarray(Dv)
    x = h * rt
    return finish(dc / h * (special.erfcx(x) - 1 + 2 * x / math.sqrt(math.pi)))


# --- inverse problems ---------------------------------------------------------------------------


@guard
def half_time(shape: str, D: ArrayLike, size: ArrayLike) -> FloatOrArray:
    r"""Time at which half the equilibrium uptake is reached (surface at equilibrium).

    Parameters
    ----------
    shape : {'slab', 'cylinder', 'sphere'}
        Body shape.
    D : float or array_like
        Diffusivity [m^2/s].
    size : float or array_like
        Half-thickness (slab) or radius [m].

    Returns
    -------
    float or numpy.ndarray
        t_half [s].

    Notes
    -----
    For a sheet of full thickness L = 2a this is the rule
    :math:`D = 0.049\,L^2/t_{1/2}`; the constants are found by solving
    :func:`fractional_uptake` = 1/2, not tabulated.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Section 10.6.

    Examples
    --------
    >>> round(half_time("slab", 1e-11, 0.5e-3) / 3600, 3)
    1.366

    """
    s = _shape(shape)
    Dv = check_positive("D", D)
    a = check_positive("size", size)
    return finish(_half_T(s) * np.asarray(a) ** 2 / np.asarray(Dv))


@functools.lru_cache(maxsize=3)
def _half_T(shape: str) -> float:
    from scipy.optimize import brentq

    return float(brentq(lambda T: float(fractional_uptake(shape, T, 1.0, 1.0)) - 0.5, 1e-4, 1.0, xtol=1e-14))


@dataclass(frozen=True, eq=False)
class DiffusivityFit(FrozenResult):
    """Result of :func:`fit_diffusivity`.

    Attributes
    ----------
    D : float
        Least-squares diffusivity [m^2/s].
    stderr : float
        Its standard error [m^2/s] (from the Jacobian and residual variance).
    D_half_time : float
        The half-time estimate used as the first guess [m^2/s].
    residual_rms : float
        Root-mean-square residual of M_t/M_inf [-].
    n_points : int
        Number of points fitted.

    """

    D: float
    stderr: float
    D_half_time: float
    residual_rms: float
    n_points: int


@guard
def fit_diffusivity(
    shape: str,
    t: ArrayLike,
    fraction: ArrayLike,
    size: float,
    biot: float | None = None,
) -> DiffusivityFit:
    r"""Estimate D from a measured uptake or desorption curve.

    Least squares on :math:`M_t/M_\infty` with ``scipy.optimize.least_squares``
    in ln D, starting from the half-time estimate.

    Parameters
    ----------
    shape : {'slab', 'cylinder', 'sphere'}
        Body shape.
    t : array_like
        Times of the measurements [s].
    fraction : array_like
        Measured :math:`M_t/M_\infty` [-] (uptake, or fraction released).
    size : float
        Half-thickness (slab) or radius [m].
    biot : float, optional
        Mass Biot number if the surface resistance is known [-].

    Returns
    -------
    DiffusivityFit
        D, its standard error, the half-time first guess and the fit quality.

    Notes
    -----
    The standard error assumes independent, equal-variance errors in the
    fraction; a systematic misfit (residual pattern) usually means
    concentration-dependent D or a wrong M_inf.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Chapter 10.

    Examples
    --------
    >>> t = [600.0, 1800.0, 3600.0, 7200.0, 14400.0]
    >>> f = fractional_uptake("slab", t, 2e-11, 0.5e-3)
    >>> round(fit_diffusivity("slab", t, f, 0.5e-3).D / 1e-11, 6)
    2.0

    """
    from scipy.optimize import least_squares

    s = _shape(shape)
    tv = np.atleast_1d(np.asarray(check_positive("t", t), dtype=float))
    fv = np.atleast_1d(np.asarray(check_nonnegative("fraction", fraction), dtype=float))
    a = float(check_positive("size", scalar("size", size)))
    if tv.shape != fv.shape or tv.ndim != 1 or tv.size < 2:
        raise InputValueError("t and fraction must be 1-D arrays of equal length, at least two points")
    if (fv > 1.0 + 0.05).any():
        raise InputValueError("fraction values above 1 (M_t/M_inf) suggest a wrong M_inf; normalise first")
    # half-time first guess: interpolate the time of M/M_inf = 1/2 (or extrapolate with sqrt t)
    order = np.argsort(tv)
    ts, fs = tv[order], fv[order]
    if fs.max() >= 0.5 > fs.min():
        t_half = float(np.interp(0.5, np.maximum.accumulate(fs), ts))
    else:
        t_half = float(ts[-1] * (0.5 / max(fs[-1], 1e-6)) ** 2)
    D0 = _half_T(s) * a * a / t_half

    def resid(p: FloatArray) -> FloatArray:
        return np.asarray(np.asarray(fractional_uptake(s, tv, math.exp(p[0]), a, biot)) - fv, dtype=float)

    sol = least_squares(resid, [math.log(D0)], x_scale=[1.0], xtol=1e-14, ftol=1e-14, gtol=1e-14)
    D = math.exp(float(sol.x[0]))
    r = np.asarray(sol.fun, dtype=float)
    dof = max(tv.size - 1, 1)
    s2 = float(r @ r) / dof
    J = np.asarray(sol.jac, dtype=float)
    jtj = float(np.sum(J * J))
    se_ln = math.sqrt(s2 / jtj) if jtj > 0 else math.inf
    return DiffusivityFit(
        D=D,
        stderr=D * se_ln,
        D_half_time=D0,
        residual_rms=math.sqrt(float(r @ r) / tv.size),
        n_points=int(tv.size),
    )
