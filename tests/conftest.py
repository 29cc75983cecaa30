"""Shared test configuration: a deterministic hypothesis profile for CI; shared data importable."""

from __future__ import annotations

import os
import sys
import tempfile
from pathlib import Path

from hypothesis import HealthCheck, settings

# property curves are cached on disk between processes; the suite starts from a cold cache of
# its own (subprocesses inherit it), so it neither reads nor fills the user's cache
os.environ["MASSTRANSFER_CACHE_DIR"] = tempfile.mkdtemp(prefix="masstransfer-test-cache-")

# tests/ mirrors the package in subfolders; the shared validation tables live at tests/ itself
sys.path.insert(0, str(Path(__file__).parent))

settings.register_profile(
    "ci",
    derandomize=True,
    max_examples=60,
    deadline=None,
    suppress_health_check=[HealthCheck.too_slow],
    print_blob=True,
)
settings.register_profile("dev", max_examples=200, deadline=None)
settings.load_profile(os.environ.get("HYPOTHESIS_PROFILE", "ci"))
