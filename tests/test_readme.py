"""The README's downstream-test example runs as written."""

from __future__ import annotations

import subprocess
import sys
from pathlib import Path

README = Path(__file__).parent.parent / "README.md"


def _block_after(heading: str) -> str:
    text = README.read_text(encoding="utf-8")
    start = text.index("```python", text.index(heading)) + len("```python")
    return text[start : text.index("```", start)]


def test_downstream_example_passes(tmp_path):
    test_file = tmp_path / "test_downstream.py"
    test_file.write_text(_block_after("## Testing your own scripts"), encoding="utf-8")
    out = subprocess.run(
        [sys.executable, "-m", "pytest", "-q", "-p", "no:cacheprovider", str(test_file)],
        capture_output=True,
        text=True,
        cwd=tmp_path,
    )
    assert out.returncode == 0, out.stdout + out.stderr
    assert "3 passed" in out.stdout


def test_quick_start_has_exactly_two_commands():
    text = README.read_text(encoding="utf-8")
    block = text[text.index("```sh", text.index("## Quick start")) + 5 :]
    block = block[: block.index("```")]
    assert len([line for line in block.splitlines() if line.strip()]) == 2


def test_tour_blocks_run_in_order():
    import warnings

    import masstransfer as mt

    text = README.read_text(encoding="utf-8")
    tour = text[text.index("## A short tour") : text.index("## Testing your own scripts")]
    blocks = []
    rest = tour
    while "```python" in rest:
        start = rest.index("```python") + len("```python")
        end = rest.index("```", start)
        blocks.append(rest[start:end])
        rest = rest[end + 3 :]
    assert len(blocks) >= 4
    namespace: dict[str, object] = {}
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", mt.errors.EnvelopeWarning)  # the tour shows one on purpose
        for block in blocks:
            exec(compile(block, str(README), "exec"), namespace)
