r"""Carrier-gas and solvent-liquid properties over arrays of temperature.

Each property comes from ``thermo``'s temperature-dependent model for the
species (the method ``thermo`` ranks first; for a liquid, where that method's
range stops short of the liquid range, carried on by its next ranked methods,
joined where both apply and checked for continuity: see :data:`JOIN_RTOL`).
The model is resolved once per
species, sampled at Chebyshev points over the range its method covers, and
replaced by a Chebyshev interpolant whose accuracy against the ``thermo``
model is verified when it is built (relative error below
:data:`INTERPOLATION_RTOL` at the midpoints between nodes).  Evaluating the
interpolant is plain numpy arithmetic, so a million temperatures cost
milliseconds, where building a ``thermo`` object per state would cost tens of
milliseconds each.

A temperature outside the range of the underlying model raises
:class:`~masstransfer.errors.OutOfRangeError`; for a solvent this includes
any temperature at which it is not a liquid (below its melting point or
above its critical point).

Gas density is the ideal-gas value :math:`\rho = PM/(RT)`; gas viscosity,
thermal conductivity and heat capacity are the low-pressure values.  They
suit carrier gases up to a few bar away from their critical point.  Air is
treated as a mixture of N2, O2 and Ar (composition in
:data:`masstransfer._tables.AIR`) with the Wilke viscosity and Wassiljewa
(Herning-Zipperer) conductivity mixing rules of ``chemicals``.
"""

from __future__ import annotations

import bisect
import functools
import itertools
import math
from collections.abc import Callable, Mapping, Sequence
from dataclasses import dataclass
from typing import Any

import numpy as np
from numpy.polynomial import chebyshev as _cheb

from .. import _tables as data
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_positive, check_shapes, finish, guard, warn_caller
from ..constants import DEBYE, R_GAS
from ..errors import EnvelopeWarning, InputValueError, MissingConstantError, OutOfRangeError
from ._cache import load_curves, store_curves
from ._databases import loading, thermo_models
from ._species import Species, species
from ._structure import Molecule

__all__ = [
    "INTERPOLATION_RTOL",
    "JOIN_RTOL",
    "JOIN_WINDOW",
    "GasModel",
    "LiquidModel",
    "PropertyCurve",
    "gas_model",
    "henry_constant",
    "liquid_model",
    "parachor",
    "quayle_parachor",
]

#: Relative deviation an interpolant piece must reach against its model.
INTERPOLATION_RTOL = 1e-7
#: Relative deviation accepted, and recorded, for the narrowest pieces: tabulated and spline
#: models have kinks at their knots, where no polynomial piece reaches INTERPOLATION_RTOL.
KINK_RTOL = 1e-5
#: Upper reduced temperature T/Tc of the liquid volume, heat capacity and enthalpy of
#: vaporisation curves.  Their published forms have a singular slope at the critical point;
#: stopping at 0.95 Tc keeps the interpolants exact.  Viscosity, conductivity and vapour
#: pressure run to the model's own limit (at most Tc).
LIQUID_TR_MAX = 0.95
#: Temperature bounds of gas curves [K], whatever range a correlation claims.
GAS_T_BOUNDS = (10.0, 5000.0)

_NODES = (12, 24, 48)
_MAX_DEPTH = 18


def _readonly(a: Any) -> FloatArray:
    out = np.array(a, dtype=float, copy=True)
    out.flags.writeable = False
    return out


@dataclass(frozen=True, eq=False)
class PropertyCurve:
    """One temperature-dependent property as a verified piecewise Chebyshev interpolant.

    Parameters
    ----------
    quantity : str
        What it is, e.g. ``"viscosity of liquid water"``.
    unit : str
        SI unit of the values.
    source : str
        The ``thermo`` model and method it reproduces.
    T_min : float
        Lowest temperature covered [K].
    T_max : float
        Highest temperature covered [K].
    coefficients : numpy.ndarray
        Chebyshev coefficients of the log of the property, one row per piece
        (a single row, or a 1-D array, for one piece over [T_min, T_max]).
    breaks : numpy.ndarray, optional
        Piece boundaries [K], ``T_min`` first and ``T_max`` last; one more
        than the rows of ``coefficients``.
    max_error : float
        Largest relative deviation from the model found when the curve was
        verified (at the midpoints between the nodes of every piece) [-].

    Notes
    -----
    The arrays are stored as read-only copies, so no caller can change a
    curve that other calls share.

    """

    quantity: str
    unit: str
    source: str
    T_min: float
    T_max: float
    coefficients: FloatArray
    breaks: FloatArray | None = None
    max_error: float = 0.0

    def __post_init__(self) -> None:
        coef = np.atleast_2d(np.asarray(self.coefficients, dtype=float))
        breaks = (
            np.array([self.T_min, self.T_max], dtype=float)
            if self.breaks is None
            else np.asarray(self.breaks, dtype=float)
        )
        if breaks.ndim != 1 or breaks.size != coef.shape[0] + 1 or np.any(np.diff(breaks) <= 0):
            raise InputValueError(
                f"PropertyCurve {self.quantity!r}: breaks must rise strictly and number one more "
                f"than the rows of coefficients (got {breaks.size} breaks for {coef.shape[0]} rows)"
            )
        object.__setattr__(self, "coefficients", _readonly(coef))
        object.__setattr__(self, "breaks", _readonly(breaks))

    @property
    def pieces(self) -> int:
        """Number of polynomial pieces [-]."""
        return int(self.coefficients.shape[0])

    @guard
    def __call__(self, T: ArrayLike) -> FloatOrArray:
        """Evaluate at temperatures ``T`` [K]; returns values in :attr:`unit`."""
        Tv = check_positive("T", T)
        self.check_range(Tv)
        return finish(np.exp(self._log(Tv)))

    def _log(self, T: FloatOrArray) -> FloatOrArray:
        coef = self.coefficients
        b = self.breaks
        assert b is not None
        if coef.shape[0] == 1:
            x = (2.0 * T - (b[0] + b[1])) / (b[1] - b[0])
            if isinstance(x, np.ndarray) and x.ndim:
                return _chebval(x, coef[0])
            return _cheb.chebval(x, coef[0])  # type: ignore[no-any-return]
        if isinstance(T, float):
            i = min(max(bisect.bisect_right(b.tolist(), T) - 1, 0), coef.shape[0] - 1)
            x = (2.0 * T - (b[i] + b[i + 1])) / (b[i + 1] - b[i])
            return float(_cheb.chebval(x, coef[i]))
        Ta = np.asarray(T, dtype=float)
        idx = np.clip(np.searchsorted(b, Ta, side="right") - 1, 0, coef.shape[0] - 1)
        present = np.flatnonzero(np.bincount(idx.ravel(), minlength=coef.shape[0]))
        if Ta.ndim and present.size <= _PIECE_LOOP_MAX:
            # few pieces in use: each piece's own coefficients (its zero padding left out)
            out = np.empty_like(Ta)
            for i in present.tolist():
                mask = None if present.size == 1 else idx == i
                xi = Ta if mask is None else Ta[mask]
                lo_i, hi_i = float(b[i]), float(b[i + 1])
                xi = (2.0 * xi - (lo_i + hi_i)) / (hi_i - lo_i)
                vi = _clenshaw_piece(xi, coef[i])
                if mask is None:
                    return vi
                out[mask] = vi
            return out
        lo, hi = b[idx], b[idx + 1]
        x = (2.0 * Ta - (lo + hi)) / (hi - lo)
        # Clenshaw's recurrence with each point's own coefficients, one degree at a time
        b1 = np.zeros_like(x)
        b2 = np.zeros_like(x)
        for j in range(coef.shape[1] - 1, 0, -1):
            b1, b2 = coef[idx, j] + 2.0 * x * b1 - b2, b1
        return coef[idx, 0] + x * b1 - b2  # type: ignore[no-any-return]

    def check_range(self, T: FloatOrArray) -> None:
        """Raise :class:`OutOfRangeError` if any ``T`` lies outside the curve."""
        if isinstance(T, float):
            bad = not (self.T_min <= T <= self.T_max)
            shown = T
        else:
            mask = (self.T_min > T) | (self.T_max < T)
            bad = bool(mask.any())
            shown = float(np.asarray(T)[mask].ravel()[0]) if bad else 0.0
        if bad:
            raise OutOfRangeError(
                f"T={shown!r} K is outside {self.T_min:.2f}-{self.T_max:.2f} K, the range of the "
                f"{self.quantity} model ({self.source}); pass T within that range"
            )


#: Most pieces of a curve an array may fall in for the piece-by-piece evaluation; beyond, the
#: coefficients are gathered per point.
_PIECE_LOOP_MAX = 8


def _chebval(x: FloatArray, c: FloatArray) -> FloatArray:
    """``numpy.polynomial.chebyshev.chebval(x, c)`` for an array ``x``, in three work arrays.

    The same Clenshaw recurrence, operation for operation (so the same bits), written into
    buffers reused from one degree to the next instead of fresh temporaries.
    """
    n = len(c)
    if n < 3:
        return np.asarray(_cheb.chebval(x, c), dtype=float)
    x2 = 2 * x
    c1 = x2 * c[-1]
    c1 += c[-2]
    c0: Any = c[-3] - c[-1]
    spare: FloatArray | None = None
    for i in range(4, n + 1):
        new = np.subtract(c[-i], c1, out=spare)
        c1 *= x2
        c1 += c0
        spare = c0 if isinstance(c0, np.ndarray) else None
        c0 = new
    c1 *= x
    c1 += c0
    return np.asarray(c1, dtype=float)


def _clenshaw_piece(x: FloatArray, c: FloatArray) -> FloatArray:
    """One piece's polynomial at ``x``: the recurrence of the per-point path, with scalar coefficients.

    Trailing zero coefficients (a piece padded to the width of the widest) contribute exact
    zeros to the recurrence and are skipped.
    """
    nonzero = np.flatnonzero(c)
    top = int(nonzero[-1]) if nonzero.size else 0
    x2 = 2.0 * x
    b1 = np.zeros_like(x)
    b2 = np.zeros_like(x)
    spare = np.empty_like(x)
    for j in range(top, 0, -1):
        np.multiply(x2, b1, out=spare)
        spare += c[j]
        spare -= b2
        b1, b2, spare = spare, b1, b2
    out = x * b1
    out += c[0]
    out -= b2
    return out


class _ModelFailedError(Exception):
    """A database model could not be evaluated or interpolated (internal; never reaches users)."""


def _sample(func: Callable[[float], float], T: FloatArray, what: str) -> FloatArray:
    try:
        values = np.array([func(float(t)) for t in T], dtype=float)
    except Exception as exc:  # a database model failing is a missing model, not a user error
        raise _ModelFailedError(f"{what} fails to evaluate ({type(exc).__name__}: {exc})") from None
    if not np.all(np.isfinite(values)) or np.any(values <= 0.0):
        raise _ModelFailedError(f"{what} gives non-positive or non-finite values")
    return values


def _fit_piece(func: Callable[[float], float], lo: float, hi: float, what: str) -> tuple[FloatArray, float]:
    mid, half = 0.5 * (lo + hi), 0.5 * (hi - lo)
    worst = math.inf
    coef: FloatArray = np.zeros(1)
    for n in _NODES:
        x = _cheb.chebpts1(n)
        coef = np.asarray(_cheb.chebfit(x, np.log(_sample(func, mid + half * x, what)), n - 1), dtype=float)
        xm = np.cos(np.pi * np.arange(1, n) / n)  # between the nodes
        exact = _sample(func, mid + half * xm, what)
        worst = float(np.max(np.abs(np.exp(_cheb.chebval(xm, coef)) / exact - 1.0)))
        if worst < INTERPOLATION_RTOL:
            break
    return coef, worst


def _fit(
    quantity: str,
    unit: str,
    source: str,
    func: Callable[[float], float],
    T_min: float,
    T_max: float,
    joins: Sequence[float] = (),
) -> PropertyCurve:
    """Interpolate ``func`` (positive) in log space, splitting the range where needed.

    Each piece takes 12, 24 or 48 Chebyshev nodes; a piece that does not
    reach :data:`INTERPOLATION_RTOL` is halved, down to ``2**-18`` of the
    range, where :data:`KINK_RTOL` is accepted (the kinks of tabulated and
    spline models).  Where even that fails in the upper half of the range
    (a singular slope at the top), the curve ends below the failing piece.
    The worst deviation found is kept as ``max_error``.  ``joins`` are
    temperatures inside the range where ``func`` changes form (the joins of
    a curve built from several methods); pieces start and end there.
    """
    what = f"the {quantity} model ({source})"
    if not (T_max > T_min):
        raise _ModelFailedError(f"{what} covers no temperature range")
    pieces: list[tuple[float, float, FloatArray]] = []
    worst_all = 0.0
    edges = [T_min, *sorted(t for t in set(joins) if T_min < t < T_max), T_max]
    todo = [(edges[i], edges[i + 1], 0) for i in range(len(edges) - 2, -1, -1)]
    while todo:
        lo, hi, depth = todo.pop()
        coef, worst = _fit_piece(func, lo, hi, what)
        if worst >= INTERPOLATION_RTOL and depth < _MAX_DEPTH:
            m = 0.5 * (lo + hi)
            todo += [(m, hi, depth + 1), (lo, m, depth + 1)]  # left half is fitted first
            continue
        if worst >= KINK_RTOL:
            if pieces and lo > 0.5 * (T_min + T_max):
                # a singular slope at the top of the model's range (a liquid volume whose own
                # critical point lies there): the curve stops where it is still exact
                T_max = lo
                break
            raise _ModelFailedError(
                f"{what} could not be interpolated to {KINK_RTOL:g} (reached {worst:.1e})"
            )
        worst_all = max(worst_all, worst)
        pieces.append((lo, hi, coef))
    width = max(c.size for _, _, c in pieces)
    rows = np.zeros((len(pieces), width))
    for i, (_, _, c) in enumerate(pieces):
        rows[i, : c.size] = c
    breaks = np.array([p[0] for p in pieces] + [pieces[-1][1]])
    return PropertyCurve(quantity, unit, source, T_min, T_max, rows, breaks, worst_all)


#: thermo methods never used: their availability depends on an optional package, so results
#: would differ between installations.
_EXCLUDED_METHODS = frozenset({"COOLPROP"})


def _ranked(prop: Any) -> list[str]:
    """Thermo's methods for ``prop``: its own choice, then its ranking, then any others."""
    available = set(getattr(prop, "all_methods", ())) - _EXCLUDED_METHODS
    first = [prop.method] if prop.method in available else []
    order = first + [m for m in type(prop).ranked_methods if m in available and m not in first]
    return order + sorted(available - set(order), key=str)


def _thermo_curve(
    prop: Any,
    quantity: str,
    unit: str,
    T_low: float,
    T_high: float,
    core: tuple[float, float],
    extend: bool = False,
    join_rtol: float | None = None,
    direction: int = 0,
) -> PropertyCurve:
    """Fit the best of thermo's methods for ``prop`` over [T_low, T_high].

    thermo's own choice and then its ranking decide, among the methods whose
    range covers the ``core`` interval (where the fluid is most often used;
    for liquids a single reference temperature, so that a method fitted to
    data is not passed over for a wider-ranging estimate); when none covers
    it, the method covering most of it is taken.  A method
    that fails to evaluate or to interpolate is skipped for the next.  The
    curve spans the chosen method's range within [T_low, T_high].

    With ``extend`` (liquid curves), thermo's own choice comes first even
    where it does not cover the core, and a range that stops short of T_low
    or T_high is carried on by the next of thermo's ranked methods
    (:func:`_extended`); the first such curve that covers the core is taken,
    trying the methods in thermo's order and then in the order above.
    """
    methods = _ranked(prop)
    if not methods:
        raise MissingConstantError(f"thermo has no model for the {quantity}")
    c_lo, c_hi = max(core[0], T_low), min(core[1], T_high)

    def clipped(m: str) -> tuple[float, float]:
        lo, hi = prop.T_limits.get(m, (0.0, math.inf))
        return max(float(lo), T_low), min(float(hi), T_high)

    def coverage(m: str) -> float:
        lo, hi = clipped(m)
        if c_hi <= c_lo:  # a single reference temperature
            return float(lo <= c_lo <= hi and hi > lo)
        return max(0.0, min(hi, c_hi) - max(lo, c_lo)) / (c_hi - c_lo)

    def log_model(m: str) -> Callable[[float], float]:
        def f(T: float) -> float:
            return math.log(float(prop.calculate(T, m)))

        return f

    by_core = sorted(methods, key=lambda m: -coverage(m))  # a stable sort keeps thermo's order
    # joined curves start from thermo's own choice and carry it on with its ranking; only when
    # no joined curve reaches the core is the method covering the core taken instead
    order = methods + by_core if extend else by_core
    reasons: list[str] = []
    fallback: PropertyCurve | None = None
    tried: set[str] = set()
    for m in order:
        if m in tried:
            continue
        tried.add(m)
        lo, hi = clipped(m)

        def f(T: float, m: str = m) -> float:
            return float(prop.calculate(T, m))

        source = f"thermo {type(prop).__name__}, method {m}"
        try:
            curve = _fit(quantity, unit, source, f, lo, hi)
        except _ModelFailedError as exc:
            reasons.append(str(exc))
            continue
        if not extend:
            return curve
        if curve.T_min > T_low + _MIN_GAIN or curve.T_max < T_high - _MIN_GAIN:
            ranked = [(n, *clipped(n), log_model(n)) for n in methods if n != m]
            rtol = JOIN_RTOL if join_rtol is None else join_rtol
            curve = _extended(curve, log_model(m), ranked, T_low, T_high, rtol, direction)
        if curve.T_min <= c_lo and c_hi <= curve.T_max:
            return curve
        if fallback is None:
            fallback = curve
    if fallback is not None:
        return fallback
    raise MissingConstantError(
        f"none of thermo's models for the {quantity} can be used: " + "; ".join(reasons)
    )


#: Largest relative difference at which a further method may carry a curve on past the range
#: of the one before it.  Published vapour-pressure correlations of the same liquid differ by
#: several per cent near the lower ends of their ranges (below about 1 kPa), which is where the
#: joins fall; a method differing by more than this is taken to describe something else.
JOIN_RTOL = 0.10
#: Largest difference at a join of two liquid molar-volume methods (the volume changes by about
#: 0.1 %/K, so a larger step, faded over :data:`JOIN_WINDOW`, would reverse its trend).
_VOLUME_JOIN_RTOL = 0.02
#: Width of the overlap over which a join is checked, and of the band beyond the join over
#: which the difference at the join is faded out [K].
JOIN_WINDOW = 10.0
#: Shortest extension worth a join [K].
_MIN_GAIN = 0.5


def _fade(t: float) -> float:
    """Quintic step: 0 for t <= 0, 1 for t >= 1, with zero slope and curvature at both ends."""
    t = min(max(t, 0.0), 1.0)
    return t * t * t * (10.0 + t * (-15.0 + 6.0 * t))


_Part = tuple[float, float, Callable[[float], float]]


def _keeps_trend(
    g: Callable[[float], float],
    inner: Callable[[float], float],
    edge: float,
    width: float,
    shift: float,
    downward: bool,
    direction: int,
) -> bool:
    """Whether a join at ``edge`` faded over ``width`` keeps the property rising or falling.

    The log of the joined curve is sampled every 0.25 K through the fade band and 1 K into the
    curve it joins; every step must go the way ``direction`` says.
    """
    n = max(8, math.ceil(width / 0.25))
    if downward:
        Ts = [edge - width + width * i / n for i in range(n + 1)] + [edge + 0.5, edge + 1.0]
    else:
        Ts = [edge - 1.0, edge - 0.5] + [edge + width * i / n for i in range(n + 1)]
    try:
        values = []
        for T in Ts:
            inside = (edge < T) if downward else (edge > T)
            if inside:
                values.append(inner(T))
            else:
                t = (T - (edge - width)) / width if downward else ((edge + width) - T) / width
                values.append(g(T) + shift * _fade(t))
    except Exception:  # a model failing to evaluate there: no join
        return False
    steps = [b - a for a, b in itertools.pairwise(values)]
    return all(direction * d >= 0.0 for d in steps)


def _extended(
    base: PropertyCurve,
    log_base: Callable[[float], float],
    ranked: list[tuple[str, float, float, Callable[[float], float]]],
    T_low: float,
    T_high: float,
    rtol: float = JOIN_RTOL,
    direction: int = 0,
) -> PropertyCurve:
    """Carry ``base`` towards ``T_low`` and ``T_high`` with further ranked methods.

    ``log_base`` is the log of the model ``base`` was fitted to.  Below the
    range reached so far, the first of ``ranked`` (name, lowest and highest
    temperature, log of the model) that reaches lower, overlaps it,
    and agrees with it within :data:`JOIN_RTOL` over the overlap (at most
    :data:`JOIN_WINDOW` wide) is joined at the edge of that range; the same
    above.  The difference at the join is faded out over :data:`JOIN_WINDOW`
    beyond it (a quintic step in log space), so the curve is continuous, the
    chosen method is untouched over its own range and each further method is
    reproduced exactly beyond the fade.  Joins are repeated until both ends
    are reached or no method qualifies; the source names every method, its
    range and its difference at the join.  If the joined curve cannot be
    interpolated, the joins are undone, last first, until it can (at worst
    ``base`` is returned).

    ``rtol`` is the largest difference accepted at a join (at most :data:`JOIN_RTOL`; smaller
    for a property that changes little with temperature, such as the molar volume). A method
    whose range extends the curve by less than :data:`JOIN_WINDOW` is not joined (the fade
    would be steep), and with ``direction`` +1 or -1 (the property rises or falls with
    temperature) a join whose fade would reverse that trend anywhere is not made.
    """
    tol = math.log1p(rtol)
    parts: list[_Part] = [(base.T_min, base.T_max, log_base)]
    notes: list[str] = []
    joins: list[float] = []
    order: list[bool] = []  # direction of each join, in the order made
    used: set[str] = set()

    def composite(T: float) -> float:
        for lo, hi, g in parts:
            if lo <= T <= hi:
                return g(T)
        raise _ModelFailedError(f"T={T} K outside the joined parts")  # pragma: no cover

    for downward in (True, False):
        while True:
            edge = parts[0][0] if downward else parts[-1][1]
            if (edge <= T_low + _MIN_GAIN) if downward else (edge >= T_high - _MIN_GAIN):
                break
            inner = parts[0][1] if downward else parts[-1][0]
            found = None
            for name, lo, hi, g in ranked:
                if name in used:
                    continue
                reach = lo < edge - _MIN_GAIN if downward else hi > edge + _MIN_GAIN
                span = (
                    min(JOIN_WINDOW, hi - edge, inner - edge)
                    if downward
                    else min(JOIN_WINDOW, edge - lo, edge - inner)
                )
                if not reach or span < 0.0:
                    continue
                side = 1.0 if downward else -1.0
                try:
                    diffs = [
                        g(edge + side * span * q) - composite(edge + side * span * q)
                        for q in (0.0, 0.25, 0.5, 0.75, 1.0)
                    ]
                    far = lo if downward else hi
                    width = min(JOIN_WINDOW, abs(edge - far))
                    probe = [g(edge + (far - edge) * q) for q in (0.25, 0.5, 1.0)]
                except Exception:  # a model failing to evaluate is skipped for the next
                    continue
                if not all(math.isfinite(d) for d in diffs + probe) or max(abs(d) for d in diffs) > tol:
                    continue
                if abs(edge - far) < JOIN_WINDOW:
                    continue
                if direction and not _keeps_trend(g, composite, edge, width, -diffs[0], downward, direction):
                    continue
                found = (name, lo, hi, g, -diffs[0], width)
                break
            if found is None:
                break
            name, lo, hi, g, shift, width = found
            used.add(name)
            joins += [edge, edge - width if downward else edge + width]

            def part(
                T: float,
                g: Callable[[float], float] = g,
                e: float = edge,
                w: float = width,
                s: float = shift,
                d: bool = downward,
            ) -> float:
                return g(T) + s * _fade((T - (e - w)) / w if d else ((e + w) - T) / w)

            pct = 100.0 * math.expm1(abs(shift))
            order.append(downward)
            if downward:
                parts.insert(0, (lo, edge, part))
                notes.append(f"below {edge:.2f} K method {name} down to {lo:.2f} K")
            else:
                parts.append((edge, hi, part))
                notes.append(f"above {edge:.2f} K method {name} up to {hi:.2f} K")
            notes[-1] += f" (differing by {pct:.1f} % at the join, faded out over {width:.3g} K)"
    while notes:
        source = f"{base.source} from {base.T_min:.2f} to {base.T_max:.2f} K; " + "; ".join(notes)
        try:
            return _fit(
                base.quantity,
                base.unit,
                source,
                lambda T: math.exp(composite(T)),
                parts[0][0],
                parts[-1][1],
                joins,
            )
        except _ModelFailedError:  # the last method joined spoils the fit: do without it
            parts.pop(0 if order.pop() else -1)
            notes.pop()
            del joins[-2:]
    return base


def _liquid_core(sp: Species) -> tuple[float, float]:
    """Return a solvent's reference temperature: 25 C, or the nearest point of its liquid range [K]."""
    lo = (sp.Tm or 0.0) + 1.0
    hi = (sp.Tb if sp.Tb is not None else math.inf) - 1.0
    T_ref = min(max(298.15, lo), hi) if hi > lo else 298.15
    return T_ref, T_ref


def _thermo_kwargs(sp: Species) -> dict[str, Any]:
    return {
        "CASRN": sp.CAS or "",
        "MW": sp.molar_mass * 1000.0,
        "Tc": sp.Tc,
        "Pc": sp.Pc,
        "Vc": sp.Vc,
        "omega": sp.omega,
    }


@dataclass(frozen=True, eq=False)
class GasModel:
    """Low-pressure properties of one carrier gas over temperature.

    Built by :func:`gas_model`.  Attributes are :class:`PropertyCurve`
    objects; methods evaluate them for arrays of T (and P for density).
    """

    species: Species
    mu: PropertyCurve
    k: PropertyCurve
    cp_molar: PropertyCurve

    @property
    def T_min(self) -> float:
        """Lowest temperature all curves cover [K]."""
        return max(self.mu.T_min, self.k.T_min, self.cp_molar.T_min)

    @property
    def T_max(self) -> float:
        """Highest temperature all curves cover [K]."""
        return min(self.mu.T_max, self.k.T_max, self.cp_molar.T_max)

    @guard
    def density(self, T: ArrayLike, P: ArrayLike = 101325.0) -> FloatOrArray:
        """Ideal-gas density [kg/m^3] at ``T`` [K] and ``P`` [Pa]."""
        Tv = check_positive("T", T)
        Pv = check_positive("P", P)
        check_shapes(T=Tv, P=Pv)
        return finish(Pv * self.species.molar_mass / (R_GAS * Tv))

    @guard
    def viscosity(self, T: ArrayLike) -> FloatOrArray:
        """Dynamic viscosity [Pa s] at ``T`` [K]."""
        return self.mu(T)

    @guard
    def thermal_conductivity(self, T: ArrayLike) -> FloatOrArray:
        """Thermal conductivity [W/(m K)] at ``T`` [K]."""
        return self.k(T)

    @guard
    def heat_capacity(self, T: ArrayLike) -> FloatOrArray:
        """Isobaric specific heat capacity [J/(kg K)] at ``T`` [K]."""
        return finish(np.asarray(self.cp_molar(T)) / self.species.molar_mass)

    @guard
    def kinematic_viscosity(self, T: ArrayLike, P: ArrayLike = 101325.0) -> FloatOrArray:
        """Kinematic viscosity [m^2/s] at ``T`` [K] and ``P`` [Pa]."""
        return finish(np.asarray(self.viscosity(T)) / np.asarray(self.density(T, P)))

    @guard
    def prandtl(self, T: ArrayLike) -> FloatOrArray:
        """Prandtl number [-] at ``T`` [K]."""
        cp = np.asarray(self.heat_capacity(T))
        return finish(cp * np.asarray(self.viscosity(T)) / np.asarray(self.thermal_conductivity(T)))


@dataclass(frozen=True, eq=False)
class LiquidModel:
    """Properties of one solvent liquid (saturated) over temperature.

    Built by :func:`liquid_model`.  The range of every curve is limited to
    the liquid range (melting point to critical point) as well as to the
    ranges of the underlying ``thermo`` methods: thermo's chosen method,
    carried on towards both ends by its next ranked methods where they agree
    at the join within :data:`JOIN_RTOL` (each curve's ``source`` names every
    method, its range and its difference at the join).
    """

    species: Species
    molar_volume: PropertyCurve
    mu: PropertyCurve
    k: PropertyCurve
    cp_molar: PropertyCurve
    psat: PropertyCurve | None = None
    hvap: PropertyCurve | None = None

    @property
    def T_min(self) -> float:
        """Lowest temperature of the viscosity and density models [K]."""
        return max(self.mu.T_min, self.molar_volume.T_min)

    @property
    def T_max(self) -> float:
        """Highest temperature of the viscosity and density models [K]."""
        return min(self.mu.T_max, self.molar_volume.T_max)

    @guard
    def density(self, T: ArrayLike) -> FloatOrArray:
        """Saturated-liquid density [kg/m^3] at ``T`` [K]."""
        return finish(self.species.molar_mass / np.asarray(self.molar_volume(T)))

    @guard
    def viscosity(self, T: ArrayLike) -> FloatOrArray:
        """Dynamic viscosity [Pa s] at ``T`` [K]."""
        return self.mu(T)

    @guard
    def thermal_conductivity(self, T: ArrayLike) -> FloatOrArray:
        """Thermal conductivity [W/(m K)] at ``T`` [K]."""
        return self.k(T)

    @guard
    def heat_capacity(self, T: ArrayLike) -> FloatOrArray:
        """Isobaric specific heat capacity [J/(kg K)] at ``T`` [K]."""
        return finish(np.asarray(self.cp_molar(T)) / self.species.molar_mass)

    @guard
    def vapor_pressure(self, T: ArrayLike) -> FloatOrArray:
        """Saturation (vapour) pressure [Pa] at ``T`` [K]."""
        return self._need(self.psat, "vapour pressure")(T)

    @guard
    def enthalpy_vaporization(self, T: ArrayLike) -> FloatOrArray:
        """Specific enthalpy of vaporisation [J/kg] at ``T`` [K]."""
        return finish(
            np.asarray(self._need(self.hvap, "enthalpy of vaporisation")(T)) / self.species.molar_mass
        )

    @guard
    def surface_tension(self, T: ArrayLike) -> FloatOrArray:
        """Surface tension against its vapour or air [N/m] at ``T`` [K] (built on first use)."""
        return self._need(_surface_tension(self.species), "surface tension")(T)

    def _need(self, curve: PropertyCurve | None, what: str) -> PropertyCurve:
        if curve is None:
            raise MissingConstantError(
                f"thermo has no {what} model for {self.species.name!r}; supply the value yourself"
            )
        return curve


@guard(check_output=False)  # verified curves; walking the species would load it all
def gas_model(gas: str | Species) -> GasModel:
    """Resolve the carrier-gas property models of ``gas`` (cached per species).

    Parameters
    ----------
    gas : str or Species
        The carrier gas, e.g. ``"air"``, ``"nitrogen"``, ``"CO2"``.

    Returns
    -------
    GasModel
        Viscosity [Pa s], thermal conductivity [W/(m K)] and heat capacity
        [J/(kg K)] over temperature, and ideal-gas density.

    Notes
    -----
    The models are ``thermo``'s; their accuracy is that of the method
    ``thermo`` selects (for common gases, fits to reference equations,
    typically within 1-3 %).

    References
    ----------
    Bell, C. et al. (2016-2024). thermo: Chemical properties component of
    the Chemical Engineering Design Library. https://github.com/CalebBell/thermo

    Examples
    --------
    >>> air = gas_model("air")
    >>> round(air.viscosity(300.0) * 1e6, 1)
    18.5

    """
    return _gas_model(species(gas))


@guard(check_output=False)  # verified curves; walking the species would load it all
def liquid_model(liquid: str | Species) -> LiquidModel:
    """Resolve the solvent-liquid property models of ``liquid`` (cached per species).

    Parameters
    ----------
    liquid : str or Species
        The solvent, e.g. ``"water"``, ``"ethanol"``.

    Returns
    -------
    LiquidModel
        Saturated-liquid density [kg/m^3], viscosity [Pa s], thermal
        conductivity [W/(m K)] and heat capacity [J/(kg K)] over temperature.

    Notes
    -----
    The models are ``thermo``'s; liquid viscosity is its most uncertain
    property (a few per cent for common solvents, much more for estimated
    ones).

    References
    ----------
    Bell, C. et al. (2016-2024). thermo: Chemical properties component of
    the Chemical Engineering Design Library. https://github.com/CalebBell/thermo

    Examples
    --------
    >>> water = liquid_model("water")
    >>> round(water.viscosity(298.15) * 1e3, 3)
    0.89

    """
    return _liquid_model(species(liquid))


@functools.lru_cache(maxsize=128)
def _gas_model(sp: Species) -> GasModel:
    key = _model_key(sp)
    cached = load_curves("gas", key)
    if cached is not None:
        return GasModel(species=sp, **cached)
    with loading(), thermo_models():
        model = _build_gas_model(sp)
    store_curves("gas", key, {"mu": model.mu, "k": model.k, "cp_molar": model.cp_molar})
    return model


def _model_key(sp: Species) -> tuple[Any, ...]:
    """Everything a model's curves depend on: the species' identity and the constants given to thermo."""
    return (sp.CAS or sp.name, sp.molar_mass, sp.Tb, sp.Tm, sp.Tc, sp.Pc, sp.Vc, sp.omega, sp.dipole)


def _build_gas_model(sp: Species) -> GasModel:
    if sp.name == "air" and sp.CAS is None:
        return _air_model(sp)
    if not sp.CAS:
        raise MissingConstantError(
            f"species {sp.name!r} has no CAS number, so thermo has no property models for it; "
            "supply rho, mu, k and cp yourself"
        )
    from thermo import HeatCapacityGas, ThermalConductivityGas, ViscosityGas

    kw = _thermo_kwargs(sp)
    dip = None if sp.dipole is None else sp.dipole / DEBYE
    mu = ViscosityGas(CASRN=kw["CASRN"], MW=kw["MW"], Tc=sp.Tc, Pc=sp.Pc, dipole=dip)
    cp = HeatCapacityGas(CASRN=kw["CASRN"], MW=kw["MW"])
    k = ThermalConductivityGas(
        CASRN=kw["CASRN"],
        MW=kw["MW"],
        Tb=sp.Tb,
        Tc=sp.Tc,
        Pc=sp.Pc,
        Vc=sp.Vc,
        omega=sp.omega,
        dipole=dip,
    )
    name = f"gaseous {sp.name}"
    lo, hi = GAS_T_BOUNDS
    anchor = (max(273.15, sp.Tb or 0.0), 573.15)
    return GasModel(
        species=sp,
        mu=_thermo_curve(mu, f"viscosity of {name}", "Pa s", lo, hi, anchor),
        k=_thermo_curve(k, f"thermal conductivity of {name}", "W/(m K)", lo, hi, anchor),
        cp_molar=_thermo_curve(cp, f"heat capacity of {name}", "J/(mol K)", lo, hi, anchor),
    )


def _air_model(sp: Species) -> GasModel:
    from chemicals.thermal_conductivity import Wassiljewa_Herning_Zipperer
    from chemicals.viscosity import Wilke

    comp: tuple[tuple[str, float], ...] = data.AIR["composition"]  # type: ignore[assignment]
    parts = [_gas_model(species(cas)) for cas, _ in comp]
    ys = [y / sum(y for _, y in comp) for _, y in comp]
    mws = [p.species.molar_mass * 1000.0 for p in parts]
    lo = max(max(p.mu.T_min, p.k.T_min, p.cp_molar.T_min) for p in parts)
    hi = min(min(p.mu.T_max, p.k.T_max, p.cp_molar.T_max) for p in parts)
    src = "chemicals mixing rule over thermo models of N2, O2, Ar"

    def mu(T: float) -> float:
        return float(Wilke(ys, [float(p.mu(T)) for p in parts], mws))

    def k(T: float) -> float:
        return float(Wassiljewa_Herning_Zipperer(ys, [float(p.k(T)) for p in parts], mws))

    def cp(T: float) -> float:
        return sum(y * float(p.cp_molar(T)) for y, p in zip(ys, parts, strict=True))

    try:
        return GasModel(
            species=sp,
            mu=_fit("viscosity of air", "Pa s", "Wilke rule; " + src, mu, lo, hi),
            k=_fit("thermal conductivity of air", "W/(m K)", "Wassiljewa rule; " + src, k, lo, hi),
            cp_molar=_fit("heat capacity of air", "J/(mol K)", "mole average; " + src, cp, lo, hi),
        )
    except _ModelFailedError as exc:  # pragma: no cover - the component models are verified
        raise MissingConstantError(f"the air model cannot be built: {exc}") from None


@functools.lru_cache(maxsize=128)
def _liquid_model(sp: Species) -> LiquidModel:
    key = _model_key(sp)
    cached = load_curves("liquid", key)
    if cached is not None:
        return LiquidModel(species=sp, **cached)
    with loading(), thermo_models():
        model = _build_liquid_model(sp)
    names = ("molar_volume", "mu", "k", "cp_molar", "psat", "hvap")
    store_curves("liquid", key, {n: getattr(model, n) for n in names})
    return model


def _build_liquid_model(sp: Species) -> LiquidModel:
    if not sp.CAS:
        raise MissingConstantError(
            f"species {sp.name!r} has no CAS number, so thermo has no liquid models for it; "
            "pass the solvent viscosity (and other properties) yourself"
        )
    from thermo import (
        EnthalpyVaporization,
        HeatCapacityGas,
        HeatCapacityLiquid,
        ThermalConductivityLiquid,
        VaporPressure,
        ViscosityLiquid,
        VolumeLiquid,
    )

    kw = _thermo_kwargs(sp)
    T_low = sp.Tm if sp.Tm is not None else 0.0
    T_crit = sp.Tc if sp.Tc is not None else math.inf
    T_high = LIQUID_TR_MAX * T_crit
    dip = None if sp.dipole is None else sp.dipole / DEBYE
    vl = VolumeLiquid(
        CASRN=kw["CASRN"],
        MW=kw["MW"],
        Tb=sp.Tb,
        Tc=sp.Tc,
        Pc=sp.Pc,
        Vc=sp.Vc,
        omega=sp.omega,
        dipole=dip,
    )
    mu = ViscosityLiquid(
        CASRN=kw["CASRN"], MW=kw["MW"], Tm=sp.Tm, Tc=sp.Tc, Pc=sp.Pc, Vc=sp.Vc, omega=sp.omega
    )
    k = ThermalConductivityLiquid(
        CASRN=kw["CASRN"], MW=kw["MW"], Tm=sp.Tm, Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, omega=sp.omega
    )
    cpg = HeatCapacityGas(CASRN=kw["CASRN"], MW=kw["MW"])
    cp = HeatCapacityLiquid(
        CASRN=kw["CASRN"], MW=kw["MW"], Tc=sp.Tc, omega=sp.omega, Cpgm=cpg.T_dependent_property
    )
    vp = VaporPressure(CASRN=kw["CASRN"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, omega=sp.omega)
    hv = EnthalpyVaporization(CASRN=kw["CASRN"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, omega=sp.omega)
    name = f"liquid {sp.name}"
    anchor = _liquid_core(sp)
    return LiquidModel(
        species=sp,
        # joins: the molar volume changes by about 0.1 %/K, so a join may differ by at most 2 %
        # (common practice); the volume rises, the viscosity, latent heat fall with T throughout
        molar_volume=_thermo_curve(
            vl,
            f"molar volume of {name}",
            "m^3/mol",
            T_low,
            T_high,
            anchor,
            extend=True,
            join_rtol=_VOLUME_JOIN_RTOL,
            direction=1,
        ),
        mu=_thermo_curve(
            mu, f"viscosity of {name}", "Pa s", T_low, T_crit, anchor, extend=True, direction=-1
        ),
        k=_thermo_curve(k, f"thermal conductivity of {name}", "W/(m K)", T_low, T_crit, anchor, extend=True),
        cp_molar=_thermo_curve(
            cp, f"heat capacity of {name}", "J/(mol K)", T_low, T_high, anchor, extend=True
        ),
        psat=_optional_curve(vp, f"vapour pressure of {name}", "Pa", T_low, T_crit, anchor, direction=1),
        hvap=_optional_curve(
            hv, f"enthalpy of vaporisation of {name}", "J/mol", T_low, T_high, anchor, direction=-1
        ),
    )


@functools.lru_cache(maxsize=64)
def _surface_tension(sp: Species) -> PropertyCurve | None:
    """Surface tension up to 0.9 Tc (it vanishes at Tc, where its logarithm cannot be interpolated).

    Built on first use only: the liquid models most callers need do not load its tables.
    """
    if not sp.CAS:
        return None
    from thermo import SurfaceTension

    kw = _thermo_kwargs(sp)
    T_low = sp.Tm if sp.Tm is not None else 0.0
    T_high = sp.Tc if sp.Tc is not None else math.inf
    top = T_high if not math.isfinite(T_high) else T_low + 0.9 * (T_high - T_low)
    with (
        loading(),
        thermo_models(),
        np.errstate(over="ignore", under="ignore", invalid="ignore", divide="ignore"),
    ):
        st = SurfaceTension(
            CASRN=kw["CASRN"], MW=kw["MW"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, Vc=sp.Vc, omega=sp.omega
        )
        return _optional_curve(
            st, f"surface tension of liquid {sp.name}", "N/m", T_low, top, _liquid_core(sp)
        )


def _optional_curve(
    prop: Any,
    quantity: str,
    unit: str,
    T_low: float,
    T_high: float,
    anchor: tuple[float, float],
    direction: int = 0,
) -> PropertyCurve | None:
    try:
        return _thermo_curve(prop, quantity, unit, T_low, T_high, anchor, extend=True, direction=direction)
    except MissingConstantError:
        return None


#: Temperature at which the parachor is evaluated when the liquid exists there [K].
_PARACHOR_T = 298.15


@guard
def parachor(liquid: str | Species) -> float:
    r"""Parachor of a species from its surface tension and liquid density.

    .. math:: \mathcal{P} = \frac{\sigma^{1/4} M}{\rho_L - \rho_V}

    evaluated by ``chemicals.Parachor`` with ``thermo``'s surface-tension
    and liquid-volume models at 298.15 K, or at the normal boiling point
    for species that are not liquid at 298.15 K (the vapour density is
    neglected).  A user-supplied ``Species.parachor`` is returned as is;
    for a hand-built species, or one without surface-tension data, the
    parachor is estimated from its structure by :func:`quayle_parachor`.

    Parameters
    ----------
    liquid : str or Species
        The species.

    Returns
    -------
    float
        Parachor [N^0.25 m^2.75/mol] (multiply by 5.623413e6 for the
        tabulated cm^3 g^0.25 s^-0.5 mol^-1 form).

    Notes
    -----
    The parachor varies by about 1 % over the liquid range (Poling et al.
    2001, Section 12-3), so one reference temperature serves.

    References
    ----------
    Sugden, S. (1924). *J. Chem. Soc., Trans.* 125, 1177-1189.
    https://doi.org/10.1039/CT9242501177

    Examples
    --------
    >>> round(parachor("water") * 5.623413e6, 1)
    52.6

    """
    return _parachor(species(liquid))


@functools.lru_cache(maxsize=256)
def _parachor(sp: Species) -> float:
    with loading(), thermo_models():
        return _compute_parachor(sp)


def _compute_parachor(sp: Species) -> float:
    if sp.parachor is not None:
        return sp.parachor
    measured = _thermo_parachor(sp) if sp.CAS else None
    if measured is not None:
        return measured
    if sp.atoms:  # a hand-built species, or one thermo lacks the data for: from structure
        from ._species import _molecule

        readable = sp.smiles if sp.smiles and _molecule(sp.smiles) is not None else None
        return quayle_parachor(dict(sp.atoms), readable)
    raise MissingConstantError(
        f"species {sp.name!r} has no parachor, no surface-tension data and no formula or SMILES "
        "to estimate one from; supply Species(..., parachor=...) [N^0.25 m^2.75/mol] or its formula"
    )


def _thermo_parachor(sp: Species) -> float | None:
    """Parachor from thermo's surface tension and liquid density, or None without the data."""
    from chemicals import Parachor
    from thermo import SurfaceTension, VolumeLiquid

    kw = _thermo_kwargs(sp)
    st = SurfaceTension(
        CASRN=kw["CASRN"], MW=kw["MW"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, Vc=sp.Vc, omega=sp.omega
    )
    vl = VolumeLiquid(CASRN=kw["CASRN"], MW=kw["MW"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, Vc=sp.Vc, omega=sp.omega)
    if st.method is None or vl.method is None:
        return None
    lo1, hi1 = st.T_limits[st.method]
    lo2, hi2 = vl.T_limits[vl.method]
    candidates = [_PARACHOR_T] + ([sp.Tb] if sp.Tb is not None else [])
    candidates.append(0.5 * (max(lo1, lo2) + min(hi1, hi2)))
    for T in candidates:
        if (sp.Tm is None or sp.Tm < T) and max(lo1, lo2) <= T <= min(hi1, hi2):
            try:
                sigma = float(st.calculate(T, st.method))
                rho = sp.molar_mass / float(vl.calculate(T, vl.method))
                value = float(Parachor(sp.molar_mass * 1000.0, rho, 0.0, sigma))
            except Exception:  # a database model failing is missing data, not a user error
                continue
            if math.isfinite(value) and value > 0:
                return value
    return None


#: Tabulated cgs parachor [cm^3 g^0.25 s^-0.5 mol^-1] per SI parachor [N^0.25 m^2.75/mol].
PARACHOR_CGS_PER_SI = 5.623413e6


@guard
def quayle_parachor(atoms: Mapping[str, int], smiles: str | None = None) -> float:
    r"""Parachor estimated from structure by Quayle's group contributions.

    .. math:: \mathcal{P} = \sum_i n_i P_i + \sum_{\mathrm{bonds}} P_b + \sum_{\mathrm{rings}} P_r

    Parameters
    ----------
    atoms : mapping of str to int
        Atom counts [-], hydrogens included, e.g. ``{"C": 6, "H": 6}``.
    smiles : str, optional
        SMILES string; when given, double and triple bonds, ester, acid and
        nitro groups and ring closures get their increments.  Without it,
        each degree of unsaturation of the formula counts as one internal
        double bond.

    Returns
    -------
    float
        Parachor [N^0.25 m^2.75/mol] (multiply by :data:`PARACHOR_CGS_PER_SI`
        for the tabulated cgs form).

    Raises
    ------
    MissingConstantError
        If an element has no published increment.

    Notes
    -----
    Quayle's increments reproduce measured parachors of ordinary organic
    liquids to about 2 % (Poling et al. 2001, Section 12-3).  Branching
    corrections are not applied (they change the value by under 1 %);
    aromatic rings are counted as their Kekule double bonds.

    References
    ----------
    Quayle, O. R. (1953). The parachors of organic compounds. *Chem. Rev.*
    53, 439-589. https://doi.org/10.1021/cr60166a003

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Section 12-3.

    Examples
    --------
    >>> round(quayle_parachor({"C": 6, "H": 6}, "c1ccccc1") * PARACHOR_CGS_PER_SI, 1)
    205.1

    """
    from ._species import check_structure

    mol = check_structure(atoms, smiles)
    inc = data.QUAYLE_PARACHOR_ATOMS
    bond = data.QUAYLE_PARACHOR_BONDS
    total = 0.0
    for el, n in atoms.items():
        if el not in inc:
            raise MissingConstantError(
                f"Quayle's parachor method has no increment for element {el!r}; supply "
                "Species(..., parachor=...) [N^0.25 m^2.75/mol]"
            )
        total += n * inc[el]
    if mol is None:
        halogens = sum(atoms.get(x, 0) for x in ("F", "Cl", "Br", "I"))
        unsaturation = atoms.get("C", 0) - (atoms.get("H", 0) + halogens) / 2 + atoms.get("N", 0) / 2 + 1
        total += max(0.0, unsaturation) * bond["double_internal"]
        return total / PARACHOR_CGS_PER_SI
    total += _structure_parachor(mol)
    return total / PARACHOR_CGS_PER_SI


def _structure_parachor(mol: Molecule) -> float:
    """Bond, group and ring increments of Quayle's method for one molecule (cgs units)."""
    bond = data.QUAYLE_PARACHOR_BONDS
    el = mol.elements
    total = 0.0
    handled: set[tuple[int, int]] = set()
    for i, e in enumerate(el):
        nbrs = mol.neighbours(i)
        if e == "C":
            dbl_o = [j for j, o in nbrs if el[j] == "O" and o == 2.0]
            single_o = [j for j, o in nbrs if el[j] == "O" and o == 1.0]
            if dbl_o and single_o:
                oh = [j for j in single_o if len(mol.neighbours(j)) == 1]
                if oh:  # -COOH: the group value replaces C + 2 O + H
                    total += bond["COOH"] - 9.0 - 2 * 20.0 - 15.5
                else:  # ester -COO-: both oxygens as one increment
                    total += bond["ester_O2"] - 2 * 20.0
                handled.add(tuple(sorted((i, dbl_o[0]))))  # type: ignore[arg-type]
        if e == "N":
            oxy = [j for j, _ in nbrs if el[j] == "O"]
            if len(oxy) == 2:  # nitro: the group value replaces N + 2 O
                total += bond["NO2"] - 17.5 - 2 * 20.0
                for j in oxy:
                    handled.add(tuple(sorted((i, j))))  # type: ignore[arg-type]
    aromatic_bonds = 0
    in_aromatic_ring = {x for ring in mol.rings if ring.aromatic for x in ring.atoms}
    for (a, b), order in mol.bonds.items():
        if (a, b) in handled:
            continue
        pair = {el[a], el[b]}
        if order == 1.5:
            aromatic_bonds += 1
        elif order == 2.0:
            if pair & {"S", "P"} and "O" in pair:
                total += bond["semipolar"]
            else:
                terminal = any(mol.hydrogens(x) >= 2 or len(mol.neighbours(x)) == 1 for x in (a, b))
                aromatic = a in in_aromatic_ring and b in in_aromatic_ring  # Kekule form
                total += bond["double_terminal"] if terminal or aromatic else bond["double_internal"]
        elif order >= 3.0:
            total += bond["triple"]
    total += (aromatic_bonds // 2) * bond["double_terminal"]
    for ring in mol.rings:
        total += data.QUAYLE_PARACHOR_RINGS.get(ring.size, 0.0)
    return total


_HENRY_TABLES = ("Sander T dep", "ChemSep Henry", "Sander Const")


@guard
def henry_constant(solute: str | Species, solvent: str | Species, T: ArrayLike) -> FloatOrArray:
    r"""Henry's-law constant of a dilute gas in a solvent, :math:`p_A = H\,x_A`.

    .. math:: H = \exp\left(A + \frac{B}{T} + C\ln T + DT + \frac{E}{T^2} + FT^2\right)

    with the coefficients of the first of the ``thermo`` interaction-parameter
    tables that holds the pair: Sander's temperature-dependent compilation,
    the ChemSep set, then Sander's constants.

    Parameters
    ----------
    solute : str or Species
        Dissolved gas, e.g. ``"oxygen"``.
    solvent : str or Species
        Solvent, e.g. ``"water"``.
    T : float or array_like
        Temperature [K].

    Returns
    -------
    float or numpy.ndarray
        H [Pa] on the mole-fraction scale (the slope of the equilibrium line
        is m = H/P).

    Raises
    ------
    MissingConstantError
        If none of the tables holds the pair; pass your own constant to the
        numeric functions instead.

    Notes
    -----
    Compilations scatter by 10-30 % for many gases; Sander (2015) lists the
    spread.  The equation form is the one ``chemicals.Henry_pressure``
    evaluates, written here in numpy for arrays of T.

    References
    ----------
    Sander, R. (2015). Compilation of Henry's law constants (version 4.0)
    for water as solvent. *Atmos. Chem. Phys.* 15, 4399-4981.
    https://doi.org/10.5194/acp-15-4399-2015

    Examples
    --------
    >>> round(henry_constant("oxygen", "water", 298.15) / 1e9, 2)
    4.34

    """
    a, b = species(solute), species(solvent)
    Tv = check_positive("T", T)
    A, B, C, D, E, F = _henry_coefficients(a, b)
    Ta = np.asarray(Tv, dtype=float)
    lo = b.Tm if b.Tm is not None else 0.0
    hi = b.Tc if b.Tc is not None else math.inf
    if Ta.size and (Ta.min() < lo or Ta.max() > hi):
        raise OutOfRangeError(
            f"T from {Ta.min():.6g} to {Ta.max():.6g} K leaves the liquid range of the solvent "
            f"{b.name!r} ({lo:.2f} K melting point to {hi:.2f} K critical point); no Henry's-law "
            "constant exists there"
        )
    if Ta.size and (Ta.min() < _HENRY_T_RANGE[0] or Ta.max() > _HENRY_T_RANGE[1]):
        warn_caller(
            f"henry_constant: T from {Ta.min():.6g} to {Ta.max():.6g} K is outside "
            f"{_HENRY_T_RANGE[0]:g}-{_HENRY_T_RANGE[1]:g} K, where the compiled temperature "
            "dependences (fitted near 298.15 K) are extrapolated; prefer measured solubilities",
            EnvelopeWarning,
        )
    return finish(np.exp(A + (B + E / Ta) / Ta + C * np.log(Ta) + Ta * (D + F * Ta)))


#: Temperatures over which the compiled Henry's-law temperature dependences are used without a
#: warning: the compilations fit van 't Hoff forms to data mostly between the ice point and the
#: normal boiling point of water (Sander 2015, sec. 2.4).
_HENRY_T_RANGE = (273.15, 373.15)


@functools.lru_cache(maxsize=256)
def _henry_coefficients(a: Species, b: Species) -> tuple[float, ...]:
    if not a.CAS or not b.CAS:
        raise MissingConstantError(
            f"no Henry's-law data without CAS numbers ({a.name!r} in {b.name!r}); pass the constant yourself"
        )
    with loading():
        from thermo.interaction_parameters import IPDB

        for table in _HENRY_TABLES:
            pair = [a.CAS, b.CAS]
            if IPDB.has_ip_specific(table, pair, "A"):
                return tuple(
                    float(IPDB.get_ip_asymmetric_matrix(table, pair, key)[0][1])
                    for key in ("A", "B", "C", "D", "E", "F")
                )
    raise MissingConstantError(
        f"no Henry's-law constant for {a.name!r} in {b.name!r} in the thermo tables "
        f"({', '.join(_HENRY_TABLES)}); pass your own constant to the numeric functions"
    )
