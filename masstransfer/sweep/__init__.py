"""Design-space sweeps on dask: chunked grids, block-by-block evaluation, a ready chain.

Every numbers-in function that works state by state already accepts dask arrays and returns a
lazy dask array (nothing is computed until you ask).  This subpackage adds what a sweep needs
around them:

- ``design_grid``: a chunked, lazy grid over named axes (T, P, h, ...), never materialised;
- ``evaluate``: map any function of numpy arrays (a names-in chain, a result field) over the
  grid's blocks, lazily;
- ``evaporation_flux``: the chain h -> k_c -> molar flux of a liquid evaporating into a gas.

Run the result on a ``dask.distributed`` cluster by creating a ``Client`` before computing, or
locally with dask's default threads.  Requires ``pip install "masstransfer[dask]"``.
"""

from __future__ import annotations

from ._grid import design_grid, evaluate, evaporation_flux

__all__ = ["design_grid", "evaluate", "evaporation_flux"]


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
