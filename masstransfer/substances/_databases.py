"""Access to the ``chemicals``/``thermo`` databases without third-party noise.

The databases are read with pandas on first use; some pandas releases warn
about options those readers pass.  Those warnings concern the libraries, not
the user's inputs, so they are silenced while the databases are read.

``thermo`` and ``chemicals`` load their tables lazily into module globals, which is not safe
when several threads trigger the first load at once (a half-built table left behind breaks the
process for good).  Every read therefore happens inside :func:`quiet`, which also holds one
process-wide re-entrant lock: database reads are serialised, cached results are not.
"""

from __future__ import annotations

import contextlib
import gc
import threading
import warnings
from collections.abc import Iterator

__all__ = ["quiet"]

#: Held while any database is read (re-entrant: model builders call species look-ups).
_LOCK = threading.RLock()


@contextlib.contextmanager
def quiet() -> Iterator[None]:
    """Hold the database lock and silence third-party warnings raised while reading databases."""
    with _LOCK, warnings.catch_warnings():
        warnings.simplefilter("ignore", DeprecationWarning)
        warnings.simplefilter("ignore", FutureWarning)
        warnings.simplefilter("ignore", PendingDeprecationWarning)
        warnings.simplefilter("ignore", ResourceWarning)
        try:
            yield
        finally:
            gc.collect()  # finalise any file a database reader left open, while silenced
