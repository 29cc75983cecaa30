"""Evaluate long arrays in cache-sized blocks.

A names-in chain (property curves, a diffusivity, the analogy, the conventions) makes a
dozen intermediate arrays per call.  On a million states each is 8 MB, far beyond the
processor's caches, and every step of the chain then streams through main memory: the cost
per state grows with the length of the array.  :func:`blockwise` runs the same public
function on consecutive blocks of :data:`BLOCK` states instead, writing each block's
results into preallocated output arrays, so every intermediate stays in cache and the cost
per state stays flat.  The blocks are read through a buffered :class:`numpy.nditer`, which
broadcasts the inputs block by block without ever making full-size copies of them.
"""

from __future__ import annotations

import dataclasses
import math
import warnings
from collections.abc import Callable
from typing import Any, TypeVar

import numpy as np

from ._frozen import adopting
from ._typing import FloatOrArray
from ._validation import warn_caller

__all__ = ["BLOCK", "blocked_shape", "blockwise"]

#: States per block (arrays longer than twice this are evaluated in blocks).  Chosen by
#: measurement (``python benchmarks/run.py blocks``; 8192, 16000, 32768 and 65536 compared in six
#: runs on a shared machine): 16000 was never more than about 20 % slower than the fastest at
#: 10^5 and 10^6 states; at 10^7 states 65536 was faster in three of five runs, once by a third.
BLOCK = 16000

_R = TypeVar("_R")


def blocked_shape(*values: FloatOrArray) -> tuple[int, ...] | None:
    """Return the broadcast shape of ``values`` if it is long enough to evaluate in blocks, else None."""
    shapes = [np.shape(v) for v in values if not isinstance(v, float)]
    if not shapes:
        return None
    shape = np.broadcast_shapes(*shapes)
    return shape if math.prod(shape) > 2 * BLOCK else None


def blockwise(call: Callable[..., _R], arrays: dict[str, FloatOrArray], shape: tuple[int, ...]) -> _R:
    """Evaluate ``call(**block)`` over blocks of the broadcast ``arrays`` and assemble one result.

    ``call`` returns a frozen dataclass whose fields are arrays of the block's length,
    floats constant over the whole input, strings, or a tuple of warning texts.  Array
    fields are written into output arrays of ``shape``; fields named after an input take
    the input as given; warning texts are merged in order without repeats, and the
    library's warnings issued by the blocks are issued once each after the last block.
    """
    names = [n for n, v in arrays.items() if not isinstance(v, float)]
    fixed = {n: v for n, v in arrays.items() if isinstance(v, float)}
    ops = [np.asarray(arrays[n], dtype=float) for n in names]
    total = math.prod(shape)
    outputs: dict[str, np.ndarray[Any, np.dtype[np.float64]]] = {}
    flat: dict[str, np.ndarray[Any, np.dtype[np.float64]]] = {}
    first: Any = None
    texts: dict[str, None] = {}
    offset = 0
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        it = np.nditer(
            [np.broadcast_to(op, shape) for op in ops],
            flags=["external_loop", "buffered", "zerosize_ok"],
            op_flags=[["readonly"]] * len(ops),
            order="C",
            buffersize=BLOCK,
        )
        with it:
            for chunk in it:
                n = chunk[0].shape[0]
                result = call(**dict(zip(names, chunk, strict=True)), **fixed)
                if first is None:
                    first = result
                for f in dataclasses.fields(result):  # type: ignore[arg-type]
                    v = getattr(result, f.name)
                    if f.name in arrays:
                        continue
                    if isinstance(v, np.ndarray) and v.shape == (n,):
                        if f.name not in outputs:
                            outputs[f.name] = np.empty(shape)
                            flat[f.name] = outputs[f.name].reshape(total)  # a view: C order
                        flat[f.name][offset : offset + n] = v
                    elif f.name == "warnings":
                        texts.update(dict.fromkeys(v))
                offset += n
    seen: set[tuple[str, type[Warning]]] = set()
    for w in caught:
        if (str(w.message), w.category) not in seen:
            seen.add((str(w.message), w.category))
            warn_caller(str(w.message), w.category)
    changes: dict[str, Any] = dict(outputs)
    changes.update({n: v for n, v in arrays.items() if hasattr(first, n)})
    if hasattr(first, "warnings"):
        changes["warnings"] = tuple(texts)
    # the outputs were allocated here and nothing else refers to them: the result takes them as
    # they are (made read-only) rather than copying them; the caller's inputs are still copied
    with adopting(*outputs.values()):
        return dataclasses.replace(first, **changes)  # type: ignore[no-any-return]
