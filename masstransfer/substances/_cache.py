r"""An on-disk cache of fitted property curves, so a new process need not rebuild them.

Building a gas or liquid model reads ``thermo``'s data and fits each curve, which takes
seconds in a fresh process.  The fitted curves (coefficients, breaks, range, source) are
stored once per model in the user's cache directory and read back by later processes.

- Location: ``$MASSTRANSFER_CACHE_DIR`` if set; else ``$XDG_CACHE_HOME/masstransfer``,
  ``%LOCALAPPDATA%\masstransfer`` on Windows, or ``~/.cache/masstransfer``.
- Versioned: one sub-directory per version of masstransfer, thermo and chemicals, and of
  this file format; a change of any starts afresh.
- Keyed on everything that changes a curve: the model kind and every constant passed to
  ``thermo``, hashed.
- Safe for several processes at once: each file is written to a temporary name in the same
  directory and renamed into place (atomic on POSIX and Windows); a reader sees a whole file
  or none.  An unreadable or foreign file is ignored and rebuilt.
- Off when ``MASSTRANSFER_NO_CACHE`` is set to anything but ``""`` or ``"0"``.
"""

from __future__ import annotations

import hashlib
import json
import os
import sys
import tempfile
from collections.abc import Mapping
from pathlib import Path
from typing import Any

import numpy as np

from .._version import __version__

__all__ = ["cache_directory", "load_curves", "store_curves"]

#: Bumped whenever the stored layout or the fitting changes.
FORMAT = 6


def _versions() -> str:
    from importlib.metadata import PackageNotFoundError, version

    parts = [f"mt{__version__}", f"f{FORMAT}"]
    for dist in ("thermo", "chemicals"):
        try:
            parts.append(f"{dist}{version(dist)}")
        except PackageNotFoundError:  # pragma: no cover - both are dependencies
            parts.append(f"{dist}-unknown")
    return "-".join(parts)


def cache_directory() -> Path | None:
    """Directory of this version's cache, or None when caching is switched off."""
    if os.environ.get("MASSTRANSFER_NO_CACHE", "") not in ("", "0"):
        return None
    base = os.environ.get("MASSTRANSFER_CACHE_DIR")
    if base:
        root = Path(base)
    elif sys.platform == "win32" and os.environ.get("LOCALAPPDATA"):
        root = Path(os.environ["LOCALAPPDATA"]) / "masstransfer"
    else:
        xdg = os.environ.get("XDG_CACHE_HOME")
        root = (Path(xdg) if xdg else Path.home() / ".cache") / "masstransfer"
    return root / _versions()


def _path(kind: str, key: tuple[Any, ...]) -> Path | None:
    where = cache_directory()
    if where is None:
        return None
    digest = hashlib.sha256(repr((kind, key)).encode()).hexdigest()[:32]
    return where / f"{kind}-{digest}.npz"


def load_curves(kind: str, key: tuple[Any, ...]) -> dict[str, Any] | None:
    """Return the stored curves of one model as ``{name: PropertyCurve or None}``, or None."""
    from ._properties import PropertyCurve

    path = _path(kind, key)
    if path is None or not path.is_file():
        return None
    try:
        with open(path, "rb") as fh, np.load(fh, allow_pickle=False) as z:
            meta = json.loads(str(z["meta"]))
            if meta.get("key") != repr((kind, key)):
                return None  # a digest collision or a foreign file
            out: dict[str, Any] = {}
            for name, m in meta["curves"].items():
                if m is None:
                    out[name] = None
                    continue
                out[name] = PropertyCurve(
                    m["quantity"],
                    m["unit"],
                    m["source"],
                    float(m["T_min"]),
                    float(m["T_max"]),
                    np.array(z[f"{name}.coefficients"]),
                    np.array(z[f"{name}.breaks"]),
                    float(m["max_error"]),
                )
            return out
    except Exception:  # unreadable, truncated by a crash or from elsewhere: rebuild it
        return None


def store_curves(kind: str, key: tuple[Any, ...], curves: Mapping[str, Any]) -> None:
    """Store one model's curves; any failure (read-only disk, full disk) is ignored."""
    path = _path(kind, key)
    if path is None:
        return
    meta: dict[str, Any] = {"key": repr((kind, key)), "curves": {}}
    arrays: dict[str, Any] = {}
    for name, c in curves.items():
        if c is None:
            meta["curves"][name] = None
            continue
        meta["curves"][name] = {
            "quantity": c.quantity,
            "unit": c.unit,
            "source": c.source,
            "T_min": c.T_min,
            "T_max": c.T_max,
            "max_error": c.max_error,
        }
        arrays[f"{name}.coefficients"] = c.coefficients
        arrays[f"{name}.breaks"] = c.breaks
    try:
        path.parent.mkdir(parents=True, exist_ok=True)
        fd, tmp = tempfile.mkstemp(dir=path.parent, prefix=".tmp-", suffix=".npz")
        try:
            with os.fdopen(fd, "wb") as fh:
                np.savez(fh, meta=np.array(json.dumps(meta)), **arrays)
            os.replace(tmp, path)
        finally:
            if os.path.exists(tmp):
                os.unlink(tmp)
    except OSError:
        return
