"""Chunked design-space grids and block-by-block evaluation on dask."""

from __future__ import annotations

import functools
import importlib
import inspect
import math
from collections.abc import Callable, Mapping
from typing import Any

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import as_float, check_nonnegative, check_positive, finish, guard, scalar
from ..errors import InputShapeError, InputTypeError, InputValueError, MissingDependencyError
from ..substances._species import Species

__all__ = ["design_grid", "evaluate", "evaporation_flux"]


def _dask_array() -> Any:
    try:
        return importlib.import_module("dask.array")
    except ImportError as exc:  # pragma: no cover - the test extra installs dask
        raise MissingDependencyError(
            'masstransfer.sweep needs dask: pip install "masstransfer[dask]"'
        ) from exc


def _block_chunks(shape: tuple[int, ...], states: int) -> tuple[int, ...]:
    """Chunk sizes per axis so that one block holds at most ``states`` states (last axes whole first)."""
    chunks = [1] * len(shape)
    room = states
    for i in range(len(shape) - 1, -1, -1):
        take = max(1, min(shape[i], room))
        chunks[i] = take
        room = max(1, room // take)
    return tuple(chunks)


@guard(check_output=False)
def design_grid(*, block_states: float = 1 << 20, **axes: ArrayLike) -> dict[str, Any]:
    """Build a lazy, chunked grid over named axes: every combination of their values.

    Parameters
    ----------
    block_states : int
        Most states in one block [-], a whole number (default 2**20: 8 MB per float64 array), the unit of
        work a dask worker holds in memory at once.
    **axes : array_like
        One 1-D array of values per axis, in its SI unit (T [K], P [Pa], h [W/(m^2 K)], ...).
        The grid's axes follow their order.

    Returns
    -------
    dict of str to dask.array.Array
        For each axis, a lazy array of the full grid shape holding that axis's value at every
        state; each is a broadcast view of the 1-D values, so the grid costs no memory until
        a block is computed.  Pass them to any state-by-state function.

    Notes
    -----
    The grid holds ``prod(len(axis))`` states.  Blocks keep the last axes whole first, so a
    block is a contiguous slab of the grid.  Results are the same as numpy's on the same
    values, block by block.

    References
    ----------
    Rocklin, M. (2015). Dask: parallel computation with blocked algorithms and task
    scheduling. *Proc. 14th Python in Science Conf.*, 130-136.
    https://doi.org/10.25080/Majora-7b98e3ed-013

    Examples
    --------
    >>> grid = design_grid(T=[300.0, 320.0, 340.0], h=[10.0, 20.0], block_states=4)
    >>> grid["T"].shape, grid["T"].chunks
    ((3, 2), ((2, 1), (2,)))
    >>> grid["h"][1].compute().tolist()
    [10.0, 20.0]

    """
    da = _dask_array()
    states = check_positive("block_states", scalar("block_states", block_states), "pass a positive count")
    if states != math.floor(states) or states > 2.0**40:
        raise InputValueError(
            f"block_states={block_states!r} must be a whole number of states from 1 to 2**40"
        )
    if not axes:
        raise InputValueError("design_grid needs at least one axis, e.g. T=numpy.linspace(290.0, 350.0, 61)")
    values: dict[str, FloatArray] = {}
    for name, v in axes.items():
        arr = np.atleast_1d(np.asarray(as_float(name, v), dtype=float))
        if arr.ndim != 1 or arr.size == 0:
            raise InputShapeError(f"{name} must be a non-empty 1-D array of values, not shape {arr.shape}")
        if not np.all(np.isfinite(arr)):
            raise InputValueError(f"{name} holds non-finite values; pass finite values for every axis")
        values[name] = arr
    shape = tuple(a.size for a in values.values())
    chunks = _block_chunks(shape, int(states))
    grid: dict[str, Any] = {}
    for i, (name, arr) in enumerate(values.items()):
        view = [1] * len(shape)
        view[i] = arr.size
        axis_chunks = tuple(c if n > 1 else 1 for c, n in zip(chunks, view, strict=True))
        axis = da.from_array(arr.reshape(view), chunks=axis_chunks)
        grid[name] = da.broadcast_to(axis, shape, chunks=chunks)
    return grid


def _unfilled(fn: Callable[..., Any], names: tuple[str, ...], constants: dict[str, Any]) -> list[str]:
    """List the required parameters of ``fn`` that neither the grid nor the constants give."""
    try:
        params = inspect.signature(fn).parameters.values()
    except (TypeError, ValueError):  # a callable whose signature cannot be read: call it as given
        return []
    given = set(names) | set(constants)
    return [
        p.name
        for p in params
        if p.default is inspect.Parameter.empty
        and p.kind in (inspect.Parameter.POSITIONAL_OR_KEYWORD, inspect.Parameter.KEYWORD_ONLY)
        and p.name not in given
    ]


def _call_block(
    fn: Callable[..., Any], names: tuple[str, ...], constants: dict[str, Any], *blocks: FloatArray
) -> FloatArray:
    out = np.asarray(fn(**dict(zip(names, blocks, strict=True)), **constants), dtype=float)
    return out if out.shape == blocks[0].shape else np.broadcast_to(out, blocks[0].shape)


@guard(check_output=False)
def evaluate(fn: Callable[..., Any], grid: Mapping[str, Any], **constants: Any) -> Any:
    """Map ``fn`` over the blocks of a grid, lazily: ``fn(**block, **constants)`` per block.

    Parameters
    ----------
    fn : callable
        A function of numpy arrays, called with one block of each grid array as keyword
        arguments [-]; it returns an array of the block's shape (a names-in chain, or a field
        of a result object: ``lambda h, T, P: mass_transfer_from_heat(h, "water", "air", T, P).k_c``).
    grid : mapping of str to array_like
        The arrays to map over, by keyword (usually from :func:`design_grid`); dask or numpy
        arrays, broadcast together [-].
    **constants : Any
        Further keyword arguments passed unchanged to every call [-].

    Returns
    -------
    dask.array.Array
        The lazy result, of the grid's shape, float64.  Nothing is computed until you call
        ``.compute()``, a reduction, or a store; errors and warnings arise then, from the
        block where they occur.

    Notes
    -----
    ``fn`` must work state by state (each output entry depends only on the same entries of
    the inputs); the blocks are independent, so dask runs them on any worker in any order.
    On a ``dask.distributed`` cluster with process workers ``fn`` must be picklable (a
    module-level function or a :func:`functools.partial` of one).

    References
    ----------
    Rocklin, M. (2015). Dask: parallel computation with blocked algorithms and task
    scheduling. *Proc. 14th Python in Science Conf.*, 130-136.
    https://doi.org/10.25080/Majora-7b98e3ed-013

    Examples
    --------
    >>> import masstransfer as mt
    >>> grid = design_grid(T=[300.0, 350.0], P=[1e5, 2e5])
    >>> D = evaluate(lambda T, P: mt.gas_diffusivity("water", "air", T, P), grid)
    >>> [round(float(v) * 1e5, 3) for v in D.compute().ravel()]
    [2.565, 1.282, 3.359, 1.679]

    """
    da = _dask_array()
    if not callable(fn):
        raise InputTypeError(f"fn={fn!r} is not callable; pass a function of the grid's arrays")
    if not isinstance(grid, Mapping):
        raise InputTypeError(
            f"grid is a {type(grid).__name__}; pass a mapping of names to arrays (design_grid)"
        )
    if not grid:
        raise InputValueError("grid is empty; pass a mapping of names to arrays, e.g. from design_grid")
    names = tuple(grid)
    try:
        arrays = da.broadcast_arrays(*(da.asarray(grid[n]) for n in names))
    except ValueError:
        listed = ", ".join(f"{n} {np.shape(grid[n])}" for n in names)
        raise InputShapeError(f"the grid's arrays do not broadcast together: {listed}") from None
    for n, a in zip(names, arrays, strict=True):
        if a.dtype.kind not in "iuf":
            raise InputTypeError(f"{n} is an array of {a.dtype}, not real numbers; pass floats")
    unfilled = _unfilled(fn, names, constants)
    if unfilled:
        raise InputTypeError(
            f"the grid ({', '.join(names)}) and the constants ({', '.join(constants) or 'none'}) leave "
            f"{', '.join(unfilled)} of {getattr(fn, '__name__', fn)!r} unfilled; pass them as constants"
        )
    block = functools.partial(_call_block, fn, names, constants)
    return da.map_blocks(block, *arrays, dtype=float, meta=np.empty((0,) * arrays[0].ndim, dtype=float))


@guard
def evaporation_flux(
    h: ArrayLike,
    solute: str | Species,
    medium: str | Species,
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    y_bulk: ArrayLike = 0.0,
) -> FloatOrArray:
    r"""Molar flux of a liquid evaporating into a gas, from a known heat-transfer coefficient.

    The chain h -> k_c -> flux: the Chilton-Colburn analogy gives the low-flux coefficient
    :math:`F = k_c P/(R T)` (:func:`masstransfer.mass_transfer_from_heat`), the liquid's
    vapour pressure the surface mole fraction, and film theory for a stagnant gas the flux:

    .. math:: N = F \ln\frac{1 - y_b}{1 - y_s}, \qquad y_s = \frac{p_{sat}(T)}{P}

    Parameters
    ----------
    h : float or array_like
        Heat-transfer coefficient of the surface [W/(m^2 K)].
    solute : str or Species
        The evaporating liquid (its vapour pressure must be known).
    medium : str or Species
        The gas it evaporates into (e.g. ``"air"``).
    T : float or array_like
        Temperature of the surface and the film [K].
    P : float or array_like
        Total pressure [Pa].
    y_bulk : float or array_like
        Mole fraction of the solute's vapour far from the surface [-].

    Returns
    -------
    float or numpy.ndarray
        Molar flux N [mol/(m^2 s)], positive from the surface into the gas; a dask array
        (lazy) when any argument is one.

    Notes
    -----
    Surface and film share one temperature (no evaporative cooling is solved for: give the
    surface temperature, e.g. from :func:`masstransfer.wet_surface_temperature`).  The error
    is that of h combined with the diffusivity's (k_c scales as D^(2/3)); film theory's
    high-flux factor is exact for the film model.  The liquid must not boil
    (:math:`p_{sat}(T) < P`).  Where the vapour is toxic or flammable, check the result against
    measured data, local codes and licensed engineering practice before relying on it.

    References
    ----------
    Chilton, T. H., & Colburn, A. P. (1934). *Ind. Eng. Chem.* 26, 1183-1187.
    https://doi.org/10.1021/ie50299a012

    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (3.1).

    Examples
    --------
    >>> round(evaporation_flux(20.0, "water", "air", 320.0) * 1e3, 1)
    82.6

    """
    from ..substances._properties import liquid_model
    from ..surface._analogy import mass_transfer_from_heat
    from ..surface._flux import high_flux_rate

    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    yb = check_nonnegative("y_bulk", y_bulk, "pass a bulk mole fraction from 0 up to below 1")
    p_sat = liquid_model(solute).vapor_pressure(Tv)
    y_s = np.asarray(p_sat) / np.asarray(Pv)
    if np.any(y_s >= 1.0):
        bad = float(np.asarray(Tv * np.ones_like(y_s))[y_s >= 1.0].ravel()[0])
        raise InputValueError(
            f"T={bad!r} K: the liquid's vapour pressure reaches the total pressure (it boils); "
            "pass a lower T or a higher P"
        )
    F = mass_transfer_from_heat(h, solute, medium, Tv, Pv).k_y
    if F is None:  # pragma: no cover - a gas medium always gives k_y
        raise InputValueError("the medium must be a gas")
    return finish(high_flux_rate(F, y_s, yb, 1.0))
