"""Access to the ``chemicals``/``thermo`` databases: one loader at a time, without third-party noise.

The databases are read with pandas on first use; some pandas releases warn about options those
readers pass.  Those warnings concern the libraries, not the user's inputs, so they are
silenced while the databases are read.

``thermo`` and ``chemicals`` load their tables lazily into module globals, which is not safe
when several threads trigger the first load at once (a half-built table left behind breaks the
process for good).  Every read therefore happens inside :func:`loading` (or :func:`quiet`),
which holds one process-wide re-entrant lock: database reads and model builds are serialised,
cached results are not.
"""

from __future__ import annotations

import contextlib
import gc
import threading
import warnings
from collections.abc import Iterator

__all__ = ["LOCK", "loading", "quiet", "thermo_models"]

#: Held while any database is read or any property model is built (re-entrant: model builders
#: call species look-ups).
LOCK = threading.RLock()
_LOCK = LOCK


@contextlib.contextmanager
def quiet() -> Iterator[None]:
    """Hold the database lock and silence third-party warnings raised while reading databases."""
    with LOCK, warnings.catch_warnings():
        warnings.simplefilter("ignore", DeprecationWarning)
        warnings.simplefilter("ignore", FutureWarning)
        warnings.simplefilter("ignore", PendingDeprecationWarning)
        warnings.simplefilter("ignore", ResourceWarning)
        try:
            yield
        finally:
            gc.collect()  # finalise any file a database reader left open, while silenced


@contextlib.contextmanager
def loading() -> Iterator[None]:
    """Hold the database lock and silence third-party warnings while reading (same as quiet)."""
    with quiet():
        yield


@contextlib.contextmanager
def thermo_models() -> Iterator[None]:
    """Build ``thermo`` property objects without CoolProp (inside :func:`loading`).

    The library never uses thermo's CoolProp methods: whether they exist depends on an optional
    package, so results would differ between installations, and importing CoolProp takes
    seconds.  thermo's own record of whether CoolProp is available is set to "no" while the
    objects are built and restored afterwards, so the caller's own use of thermo is unchanged.
    """
    from thermo import coolprop

    with LOCK:
        before = coolprop._has_CoolProp
        coolprop._has_CoolProp = False
        try:
            yield
        finally:
            coolprop._has_CoolProp = before
