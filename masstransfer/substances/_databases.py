"""Access to the ``chemicals``/``thermo`` databases: one loader at a time, without third-party noise.

The databases are read with pandas on first use, and ``thermo``/``chemicals``
fill module-level tables as they go; two threads reading them at once can
leave a half-filled table behind.  Every read therefore happens inside
:func:`loading`, which holds one process-wide re-entrant lock.  Some pandas
releases warn about options those readers pass; those warnings concern the
libraries, not the user's inputs, so they are silenced while the databases
are read.
"""

from __future__ import annotations

import contextlib
import gc
import threading
import warnings
from collections.abc import Iterator

__all__ = ["LOCK", "loading", "quiet"]

#: Held while any database is read or any property model is built (re-entrant).
LOCK = threading.RLock()


@contextlib.contextmanager
def quiet() -> Iterator[None]:
    """Silence deprecation, future and resource warnings raised while reading databases."""
    with warnings.catch_warnings():
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
    """Hold the database lock and silence third-party warnings while reading."""
    with LOCK, quiet():
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
