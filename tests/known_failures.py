"""Parametrise a test over names, marking the known failures as strict expected failures."""

from __future__ import annotations

from collections.abc import Iterable, Mapping

import pytest


def xfail_known(names: Iterable[str], known: Mapping[str, str]) -> list[object]:
    """Return ``names`` as pytest parameters, each in ``known`` marked xfail (strict) with its reason."""
    return [
        pytest.param(n, marks=pytest.mark.xfail(strict=True, reason=known[n])) if n in known else n
        for n in names
    ]
