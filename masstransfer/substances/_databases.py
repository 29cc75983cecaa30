"""Access to the ``chemicals``/``thermo`` databases without third-party noise.

The databases are read with pandas on first use; some pandas releases warn
about options those readers pass.  Those warnings concern the libraries, not
the user's inputs, so they are silenced while the databases are read.

The readers load their tables lazily into module-level state and are not safe to run from two
threads at once (as dask's threaded scheduler does on a cold cache), and warning filters are
process-wide: one re-entrant lock therefore serialises every database read.
"""

from __future__ import annotations

import contextlib
import gc
import threading
import warnings
from collections.abc import Iterator

__all__ = ["quiet"]

_LOCK = threading.RLock()


@contextlib.contextmanager
def quiet() -> Iterator[None]:
    """Silence deprecation, future and resource warnings while reading databases, one thread at a time."""
    with _LOCK, warnings.catch_warnings():
        warnings.simplefilter("ignore", DeprecationWarning)
        warnings.simplefilter("ignore", FutureWarning)
        warnings.simplefilter("ignore", PendingDeprecationWarning)
        warnings.simplefilter("ignore", ResourceWarning)
        try:
            yield
        finally:
            gc.collect()  # finalise any file a database reader left open, while silenced
