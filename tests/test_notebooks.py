"""Every notebook runs top to bottom on a fresh kernel and draws at least one figure."""

from __future__ import annotations

from pathlib import Path

import pytest

nbformat = pytest.importorskip("nbformat")
nbclient = pytest.importorskip("nbclient")

NOTEBOOKS = sorted((Path(__file__).parent.parent / "notebooks").glob("*.ipynb"))


def test_there_are_at_least_three_notebooks():
    assert len(NOTEBOOKS) >= 3


@pytest.mark.parametrize("path", NOTEBOOKS, ids=[p.stem for p in NOTEBOOKS])
def test_notebook_executes(path, tmp_path, monkeypatch):
    # the kernel draws with matplotlib's inline backend, which needs no display
    monkeypatch.delenv("MPLBACKEND", raising=False)
    nb = nbformat.read(path, as_version=4)
    client = nbclient.NotebookClient(
        nb, timeout=300, kernel_name="python3", resources={"metadata": {"path": str(tmp_path)}}
    )
    client.execute()
    text = "".join(c.source for c in nb.cells if c.cell_type == "markdown")
    assert "invented" in text.lower()
    figures = [
        o
        for c in nb.cells
        if c.cell_type == "code"
        for o in c.get("outputs", [])
        if "image/png" in o.get("data", {})
    ]
    assert figures, f"{path.name} drew no figure"
    errors = [
        o
        for c in nb.cells
        if c.cell_type == "code"
        for o in c.get("outputs", [])
        if o.get("output_type") == "error"
    ]
    assert not errors
