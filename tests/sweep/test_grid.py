"""Design grids and the h -> k_c -> flux chain on a two-worker dask.distributed cluster."""

from __future__ import annotations

import itertools
import math

import numpy as np
import pytest

da = pytest.importorskip("dask.array")
distributed = pytest.importorskip("distributed")

import masstransfer as mt  # noqa: E402
from masstransfer import errors, surface, sweep  # noqa: E402


def test_grid_is_lazy_chunked_and_complete():
    grid = sweep.design_grid(
        T=np.linspace(290.0, 350.0, 7), P=[1e5, 2e5], h=np.arange(1.0, 6.0), block_states=8
    )
    assert list(grid) == ["T", "P", "h"]
    assert grid["T"].shape == (7, 2, 5)
    blocks = [math.prod(b) for b in itertools.product(*grid["T"].chunks)]
    assert max(blocks) <= 8
    assert sum(blocks) == 70
    T, P, h = (np.asarray(grid[k]) for k in ("T", "P", "h"))
    mesh = np.meshgrid(np.linspace(290.0, 350.0, 7), [1e5, 2e5], np.arange(1.0, 6.0), indexing="ij")
    for got, want in zip((T, P, h), mesh, strict=True):
        np.testing.assert_array_equal(got, want)


@pytest.mark.parametrize(
    ("kwargs", "error"),
    [
        ({}, errors.InputValueError),
        ({"T": [[300.0]]}, errors.InputShapeError),
        ({"T": [300.0, float("nan")]}, errors.InputValueError),
        ({"T": [300.0], "block_states": 0}, errors.InputValueError),
        ({"T": [300.0], "block_states": 2.5}, errors.InputValueError),
        ({"T": [300.0], "block_states": "many"}, errors.InputTypeError),
        ({"T": ["hot"]}, errors.InputTypeError),
    ],
)
def test_grid_rejects_bad_axes(kwargs, error):
    with pytest.raises(error):
        sweep.design_grid(**kwargs)


def test_evaporation_flux_by_hand():
    # the chain written out: F = k_c P/(R T), y_s = p_sat/P, N = F ln(1/(1 - y_s))
    h, T, P = 25.0, 330.0, 101325.0
    r = mt.mass_transfer_from_heat(h, "water", "air", T, P)
    y_s = mt.liquid_model("water").vapor_pressure(T) / P
    F = r.k_c * P / (8.31446261815324 * T)  # R = N_A k, exact since SI 2019 (CODATA 2018)
    assert sweep.evaporation_flux(h, "water", "air", T, P) == pytest.approx(
        F * math.log(1 / (1 - y_s)), rel=1e-12
    )
    # a bulk already at the surface composition gives no flux; boiling is refused
    assert sweep.evaporation_flux(h, "water", "air", T, P, y_bulk=y_s) == pytest.approx(0.0, abs=1e-15)
    with pytest.raises(errors.InputValueError, match="boils"):
        sweep.evaporation_flux(h, "water", "air", 380.0, P)


def test_evaluate_maps_a_result_field_over_blocks():
    grid = sweep.design_grid(T=np.linspace(300.0, 340.0, 5), h=[10.0, 50.0], block_states=3)
    k_c = sweep.evaluate(lambda h, T: mt.mass_transfer_from_heat(h, "water", "air", T).k_c, grid)
    assert isinstance(k_c, da.Array)
    want = mt.mass_transfer_from_heat(np.asarray(grid["h"]), "water", "air", np.asarray(grid["T"])).k_c
    np.testing.assert_allclose(k_c.compute(scheduler="sync"), want, rtol=1e-14)
    with pytest.raises(errors.InputTypeError):
        sweep.evaluate("k_c", grid)
    with pytest.raises(errors.InputShapeError):
        sweep.evaluate(lambda a, b: a + b, {"a": np.ones(3), "b": np.ones(4)})


def test_chain_on_a_two_worker_cluster_matches_numpy():
    grid = sweep.design_grid(
        h=np.linspace(5.0, 200.0, 40),
        T=np.linspace(285.0, 345.0, 25),
        P=[0.8e5, 1.01325e5, 2e5],
        block_states=500,
    )
    lazy = sweep.evaporation_flux(grid["h"], "water", "air", grid["T"], grid["P"], y_bulk=0.005)
    assert lazy.npartitions >= 6
    with (
        distributed.LocalCluster(
            n_workers=2,
            threads_per_worker=1,
            processes=False,  # threads in this process: no pickling, no sockets between workers
            dashboard_address="127.0.0.1:0",  # the scheduler's status page on loopback, any free port
            memory_limit=0,  # threads share this process's memory: a limit would pause them on its size
        ) as cluster,
        distributed.Client(cluster) as client,
    ):
        assert len(client.scheduler_info()["workers"]) == 2
        got = client.compute(lazy).result(timeout=600)  # a guard against a hang, far above the real time
        peak = client.compute(lazy.max()).result(timeout=600)
    numpy_args = (np.asarray(grid["h"]), "water", "air", np.asarray(grid["T"]), np.asarray(grid["P"]))
    want = sweep.evaporation_flux(*numpy_args, y_bulk=0.005)
    np.testing.assert_allclose(got, want, rtol=1e-14)
    assert peak == pytest.approx(want.max(), rel=1e-14)
    # the flux rises with h and with T, and falls with P
    assert np.all(np.diff(got, axis=0) > 0)
    assert np.all(np.diff(got, axis=1) > 0)
    assert np.all(np.diff(got, axis=2) < 0)


def test_result_objects_are_refused_with_a_pointer_to_sweep():
    with pytest.raises(errors.InputTypeError, match=r"sweep\.evaluate"):
        mt.mass_transfer_from_heat(30.0, "water", "air", da.ones(3) * 300.0)
    with pytest.raises(errors.InputTypeError):
        surface.correlation("sphere-ranz-marshall").evaluate("heat", Re=da.ones(3), Pr=0.7)


def test_readme_sweep_example_runs():
    from pathlib import Path

    readme = (Path(__file__).parents[2] / "README.md").read_text(encoding="utf-8")
    section = readme[readme.index("## Design-space sweeps on dask") :]
    start = section.index("```python") + len("```python")
    namespace: dict[str, object] = {}
    exec(compile(section[start : section.index("```", start)], "README.md", "exec"), namespace)
    assert 0.0 < namespace["N_mean"] < namespace["N_max"] < 10.0  # mol/(m^2 s), up to h = 200 at 345 K


def test_missing_constants_are_named_before_anything_runs():
    grid = sweep.design_grid(T=np.linspace(300.0, 350.0, 4), h=[10.0, 20.0])
    with pytest.raises(mt.errors.InputTypeError, match="solute"):
        sweep.evaluate(sweep.evaporation_flux, grid)
