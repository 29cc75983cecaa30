"""Drying time: the constant-rate period, then the falling-rate period by diffusion in the body.

The constant-rate period removes moisture at the rate of a freely wet surface (from
:func:`evaporation_rate`) until the mean moisture content reaches the critical value.  From
there the moisture diffuses to the surface, which is taken to be at the equilibrium moisture
content: the fraction of the free moisture removed follows the transient solutions of
:mod:`masstransfer.bodies` (Crank) for a slab, cylinder or sphere, starting from a uniform
moisture content equal to the critical one.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_nonnegative, check_positive, check_shapes, finish, guard, scalar
from ..errors import InputTypeError, InputValueError, UnknownMethodError
from ._evaporation import EvaporationResult
from ._state import whole_number

__all__ = ["DryingResult", "drying_time"]

#: Volume per exposed area of each body, as a multiple of its size (half-thickness or radius).
_VOLUME_PER_AREA = {"slab": 1.0, "cylinder": 0.5, "sphere": 1.0 / 3.0}
#: Bisection halvings on log10(Dt/a^2) between 1e-14 and 1e4 (to about 1e-13 in the log).
_ITERATIONS = 60


@dataclass(frozen=True)
class DryingResult:
    """Drying time and drying curve of a wet body.

    Attributes
    ----------
    t_constant : float or numpy.ndarray
        Duration of the constant-rate period [s].
    t_falling : float or numpy.ndarray
        Duration of the falling-rate period [s].
    t_total : float or numpy.ndarray
        Total drying time [s].
    constant_rate : float or numpy.ndarray
        Drying rate in the constant-rate period [kg/(m^2 s)].
    curve_time : numpy.ndarray
        Times along the drying curve [s]; the last axis runs along the curve.
    curve_moisture : numpy.ndarray
        Mean moisture content (dry basis) at those times [kg/kg dry solid].
    shape : str
        The body: slab, cylinder or sphere.
    method : str
        How each period was computed.

    """

    t_constant: FloatOrArray
    t_falling: FloatOrArray
    t_total: FloatOrArray
    constant_rate: FloatOrArray
    curve_time: FloatArray
    curve_moisture: FloatArray
    shape: str
    method: str


def _release(shape: str, tau: FloatArray, biot: float | None) -> FloatArray:
    from ..bodies._transient import fractional_release

    return np.asarray(fractional_release(shape, tau, 1.0, 1.0, biot), dtype=float)


def _tau_for_fraction(shape: str, fraction: FloatArray, biot: float | None) -> FloatArray:
    """Dimensionless time D t / a^2 at which the released fraction reaches ``fraction``."""
    lo = np.full_like(fraction, -14.0)
    hi = np.full_like(fraction, 4.0)
    for _ in range(_ITERATIONS):
        mid = 0.5 * (lo + hi)
        short = _release(shape, 10.0**mid, biot) < fraction
        lo = np.where(short, mid, lo)
        hi = np.where(short, hi, mid)
    return np.asarray(10.0 ** (0.5 * (lo + hi)))


@guard
def drying_time(
    mass_flux: ArrayLike | EvaporationResult,
    *,
    shape: str,
    size: ArrayLike,
    dry_density: ArrayLike,
    D: ArrayLike,
    X_initial: ArrayLike,
    X_critical: ArrayLike,
    X_final: ArrayLike,
    X_equilibrium: ArrayLike = 0.0,
    biot: float | None = None,
    points: int = 60,
) -> DryingResult:
    r"""Time to dry a wet body from its initial to a final moisture content.

    Constant-rate period (surface wet), then falling-rate period (diffusion inside the body,
    surface at equilibrium, uniform moisture at the start of the period):

    .. math::

        t_c = \frac{\rho_s (V/A) (X_0 - X_c)}{\dot m''}, \qquad
        \frac{X_c - X}{X_c - X_e} = F\!\left(\frac{D\,(t - t_c)}{a^2}\right)

    with F the fraction released by a slab, cylinder or sphere (Crank), V/A = a, a/2 or
    a/3 for a slab dried on both faces, a cylinder and a sphere of half-thickness or radius a.

    Parameters
    ----------
    mass_flux : float or array_like or EvaporationResult
        Drying rate in the constant-rate period [kg/(m^2 s)], or the result of
        :func:`evaporation_rate` for the drying gas (its ``mass_flux`` is used).
    shape : {'slab', 'cylinder', 'sphere'}
        The body; a slab is dried on both faces (a slab on an impervious tray behaves as one
        of twice its thickness dried on both faces).
    size : float or array_like
        Half-thickness (slab) or radius (cylinder, sphere) [m].
    dry_density : float or array_like
        Mass of dry solid per volume of body [kg/m^3].
    D : float or array_like
        Effective moisture diffusivity in the body in the falling-rate period [m^2/s].
    X_initial : float or array_like
        Initial moisture content, dry basis [kg/kg dry solid].
    X_critical : float or array_like
        Critical moisture content, where the falling-rate period starts [kg/kg].
    X_final : float or array_like
        Final moisture content wanted, above ``X_equilibrium`` [kg/kg].
    X_equilibrium : float or array_like
        Equilibrium moisture content with the drying gas [kg/kg].
    biot : float, optional
        Mass Biot number of the falling-rate period, :math:`k\,a/(K D)` [-] (k the external
        coefficient, K the partition between body and gas); None for a surface at equilibrium.
        A finite value keeps the rate finite at the start of the falling-rate period.
    points : int
        Number of points on the drying curve [-].

    Returns
    -------
    DryingResult
        The two periods, the total time [s] and the drying curve (time [s], moisture [kg/kg]).

    Raises
    ------
    InputValueError
        If the moisture contents are not in the order X_equilibrium < X_final < X_initial.

    Notes
    -----
    If the body starts below its critical moisture content, there is no constant-rate
    period and the diffusion starts from the initial content.  The diffusion model assumes
    constant D, no shrinkage and a surface at equilibrium; real falling-rate curves often
    show a concentration-dependent D (fit one from measured curves), and near the critical
    point the surface resistance still matters.  Critical and equilibrium moisture contents
    are properties of the material measured in a drying test, not predictions of this
    function.  Drying solvent-wet solids releases flammable vapour: see
    :func:`evaporation_rate`; defer to measured data, local codes and licensed practice.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Section 12.2 (rate of drying;
    time of drying, Eqs. 12.4 and 12.20-12.23).

    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Eqs. (4.18), (5.23), (6.20).

    Examples
    --------
    >>> r = drying_time(1e-4, shape="slab", size=0.01, dry_density=1400.0, D=1e-9,
    ...                 X_initial=0.4, X_critical=0.2, X_final=0.05)
    >>> round(r.t_constant / 3600, 2), round(r.t_total / 3600, 1)
    (7.78, 21.0)

    """
    if isinstance(mass_flux, EvaporationResult):
        mass_flux = mass_flux.mass_flux
    if not isinstance(shape, str):
        raise InputTypeError(f"shape={shape!r} must be one of 'slab', 'cylinder', 'sphere'")
    if shape not in _VOLUME_PER_AREA:
        raise UnknownMethodError(f"shape={shape!r} is not one of 'slab', 'cylinder', 'sphere'")
    n_points = whole_number("points", points, 2, 100_000)
    bi = None if biot is None else scalar("biot", check_positive("biot", biot))
    rate = check_positive("mass_flux", mass_flux, "pass the constant drying rate above zero [kg/(m^2 s)]")
    a = check_positive("size", size)
    rho = check_positive("dry_density", dry_density)
    Dv = check_positive("D", D)
    X0 = check_nonnegative("X_initial", X_initial)
    Xc = check_nonnegative("X_critical", X_critical)
    Xf = check_nonnegative("X_final", X_final)
    Xe = check_nonnegative("X_equilibrium", X_equilibrium)
    check_shapes(
        mass_flux=rate,
        size=a,
        dry_density=rho,
        D=Dv,
        X_initial=X0,
        X_critical=Xc,
        X_final=Xf,
        X_equilibrium=Xe,
    )
    arr: dict[str, Any] = {
        key: np.asarray(v, dtype=float)
        for key, v in {"r": rate, "a": a, "rho": rho, "D": Dv, "X0": X0, "Xc": Xc, "Xf": Xf, "Xe": Xe}.items()
    }
    if not (arr["Xe"] < arr["Xf"]).all() or not (arr["Xf"] < arr["X0"]).all():
        raise InputValueError(
            "the moisture contents must satisfy X_equilibrium < X_final < X_initial; check "
            f"X_equilibrium={X_equilibrium!r}, X_final={X_final!r}, X_initial={X_initial!r}"
        )
    X_start = np.minimum(arr["X0"], arr["Xc"])  # where the falling-rate period starts
    if (X_start <= arr["Xe"]).any():
        raise InputValueError("X_critical must exceed X_equilibrium; pass a larger critical moisture content")
    solid_per_area = arr["rho"] * arr["a"] * _VOLUME_PER_AREA[shape]  # kg dry solid / m^2 exposed
    t_c = solid_per_area * np.maximum(arr["X0"] - arr["Xc"], 0.0) / arr["r"]
    X_end_falling = np.maximum(arr["Xf"], arr["Xe"])
    fraction = (X_start - np.minimum(X_end_falling, X_start)) / (X_start - arr["Xe"])
    scale = arr["a"] ** 2 / arr["D"]  # s per unit of D t / a^2
    t_f = np.where(fraction > 0, _tau_for_fraction(shape, np.asarray(fraction, dtype=float), bi), 0.0) * scale
    # constant-rate period ends above the final content only when X_final < X_critical
    t_c = np.where(arr["Xf"] >= arr["Xc"], solid_per_area * (arr["X0"] - arr["Xf"]) / arr["r"], t_c)
    t_f = np.where(arr["Xf"] >= arr["Xc"], 0.0, t_f)
    total = t_c + t_f
    t_c, t_f = t_c * np.ones_like(total), t_f * np.ones_like(total)
    s = np.linspace(0.0, 1.0, n_points)
    t_curve = total[..., None] * s
    const_X = arr["X0"][..., None] - arr["r"][..., None] * t_curve / solid_per_area[..., None]
    in_falling = t_curve > t_c[..., None]
    tau = np.where(in_falling, (t_curve - t_c[..., None]) / scale[..., None], 0.0)
    falling_X = X_start[..., None] - (X_start - arr["Xe"])[..., None] * _release(shape, tau, bi)
    X_curve = np.where(in_falling, falling_X, const_X)
    return DryingResult(
        t_constant=finish(t_c),
        t_falling=finish(t_f),
        t_total=finish(total),
        constant_rate=finish(arr["r"] * np.ones_like(total)),
        curve_time=np.asarray(t_curve),
        curve_moisture=np.asarray(X_curve),
        shape=shape,
        method=(
            "constant-rate period at the given surface rate; falling-rate period by diffusion "
            f"in a {shape} (Crank's series), "
            + ("surface at equilibrium" if bi is None else f"surface resistance with Biot number {bi:g}")
            + ", uniform start"
        ),
    )
