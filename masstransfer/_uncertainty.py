r"""Relative standard uncertainties: from a method's stated accuracy, and through a chain.

A method's source states its accuracy in one of two ways, and each becomes a relative standard
uncertainty u (one standard deviation, as a fraction of the value):

* an average absolute deviation (AAD) from the data it was tested on, the usual statement for
  diffusivity estimates ("about 4-5 %").  For errors spread normally about zero the mean
  absolute deviation is sigma * sqrt(2/pi), about 0.80 sigma (Geary, R. C. (1935). *Biometrika*
  27, 310-332 (from memory)), so u = AAD * sqrt(pi/2), about 1.25 AAD.  Where a range is stated
  ("4-5 %") the upper end is taken.
* a bound ("within 10 %", "at most 10 %", "+/- 10 %"): read as the half-width of a uniform
  distribution, u = bound / sqrt(3) (JCGM 100:2008, *Guide to the expression of uncertainty in
  measurement*, Section 4.3.7 (from memory)).

A method stating no number has no uncertainty (None), never a guessed one.

Through a chain of power laws, :math:`y = c \prod x_i^{a_i}`, the linearised relative standard
uncertainty of y is :math:`u_y = \sqrt{\sum (a_i u_i)^2}` for independent inputs (JCGM
100:2008, Eq. (10) with relative sensitivities (from memory)).
"""

from __future__ import annotations

import functools
import math
import re
from typing import Any

import numpy as np

from ._typing import FloatOrArray
from ._validation import check_nonnegative, finish

__all__ = ["AAD_TO_SIGMA", "BOUND_TO_SIGMA", "combine", "relative_input", "stated_uncertainty"]

#: Standard deviation per unit average absolute deviation for normal errors: sqrt(pi/2).
AAD_TO_SIGMA = math.sqrt(math.pi / 2.0)
#: Standard deviation per unit half-width of a uniform distribution: 1/sqrt(3).
BOUND_TO_SIGMA = 1.0 / math.sqrt(3.0)

_PERCENT = re.compile(r"(\d+(?:\.\d+)?)(?:\s*(?:-|to|–)\s*(\d+(?:\.\d+)?))?\s*%")
_BOUND_WORDS = re.compile(r"within|at most|maximum|max\.|±|\+/-|bound", re.IGNORECASE)


def stated_uncertainty(stated: Any) -> float | None:
    """Relative standard uncertainty [-] from a method's stated accuracy, or None if it states none.

    ``stated`` is the accuracy text of a method (``"about 4-5 %"``) or a record carrying it
    (an ``accuracy_pct`` number, read as an average absolute deviation, or an ``accuracy`` text).
    """
    pct = getattr(stated, "accuracy_pct", None)
    if isinstance(pct, int | float) and not isinstance(pct, bool) and pct > 0:
        return float(pct) / 100.0 * AAD_TO_SIGMA
    text = stated if isinstance(stated, str) else getattr(stated, "accuracy", None)
    if not isinstance(text, str):
        return None
    return _from_text(text)


@functools.lru_cache(maxsize=256)
def _from_text(text: str) -> float | None:
    m = _PERCENT.search(text)
    if m is None:
        return None
    value = float(m.group(2) or m.group(1)) / 100.0
    if _BOUND_WORDS.search(text):
        return value * BOUND_TO_SIGMA
    return value * AAD_TO_SIGMA


def combine(*terms: tuple[float, FloatOrArray | None]) -> FloatOrArray | None:
    """Linearised relative standard uncertainty of a product of powers.

    Each term is ``(exponent, relative standard uncertainty)``; a term with ``None`` (not
    stated) is left out.  Returns None when no term is known.
    """
    total: FloatOrArray | None = None
    for exponent, u in terms:
        if u is None:
            continue
        part = (exponent * np.asarray(u, dtype=float)) ** 2
        total = part if total is None else total + part
    if total is None:
        return None
    return finish(np.sqrt(total))


def relative_input(name: str, value: Any) -> FloatOrArray:
    """Check a user's relative standard uncertainty (a fraction, 0 or more)."""
    return check_nonnegative(name, value, f"pass {name} as a fraction (0.10 for 10 %), zero or more")
