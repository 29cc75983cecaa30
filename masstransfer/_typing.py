"""Type aliases shared across the package."""

from __future__ import annotations

from typing import Union

import numpy as np
import numpy.typing as npt

#: A float64 numpy array.
FloatArray = npt.NDArray[np.float64]
#: What numeric functions accept: a Python number, a sequence or an array.
ArrayLike = npt.ArrayLike
#: What numeric functions return: a float for scalar input, else an array.
FloatOrArray = Union[float, FloatArray]  # noqa: UP007 - runtime alias must work on Python 3.10

__all__ = ["ArrayLike", "FloatArray", "FloatOrArray"]
