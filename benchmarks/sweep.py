"""Sweep benchmark: the h -> k_c -> flux chain over a design grid on a dask.distributed cluster.

Run ``python benchmarks/sweep.py [states]`` (default 1e8 states).  For 1 and 2 process workers
(this machine's cores), each limited to 500 MB, it reports the throughput in states per second,
its ratio to one worker, and the peak memory of each worker from the worker's own metrics (the
highest resident memory its system monitor sampled, and the operating system's high-water mark
of the process).  The grid (h, T, P and the flux, float64) totals several GB, and its result
alone is larger than a worker's limit, so it is never materialised: design_grid's axes are
broadcast views, each task computes one block of 2**17 states and reduces it at once to its
maximum, sum and count, so only those leave the workers.  Writes ``benchmarks/sweep.md``.  Like every
benchmark here, the ratios are the result, not the times.
"""

from __future__ import annotations

import datetime
import os
import platform
import resource
import sys
import time
from pathlib import Path

import dask
import numpy as np
from distributed import Client, LocalCluster

from masstransfer import sweep

MEMORY_LIMIT = 500_000_000  # bytes per worker
BLOCK_STATES = 1 << 17


def _peak_memory(dask_worker) -> tuple[float, int]:
    """(highest memory the worker's monitor sampled, the process's high-water mark) [bytes]."""
    sampled = max(dask_worker.monitor.quantities["memory"])
    return float(sampled), resource.getrusage(resource.RUSAGE_SELF).ru_maxrss * 1024  # Linux: KiB


def _block_stats(block: np.ndarray) -> tuple[float, float, int]:
    """(maximum, sum, count) of one block of fluxes."""
    return float(block.max()), float(block.sum()), int(block.size)


def run(states: float, workers: int) -> tuple[float, list[tuple[float, int]], float]:
    n_h = 200
    n_p = 5
    n_t = max(2, int(states // (n_h * n_p)))
    # the long axis first: a block then spans few of its values, so each task carries only a
    # short slice of it (a long axis last would put a long slice into every task)
    grid = sweep.design_grid(
        T=np.linspace(280.0, 350.0, n_t),
        h=np.linspace(5.0, 200.0, n_h),
        P=np.linspace(0.8e5, 2.0e5, n_p),
        block_states=BLOCK_STATES,
    )
    flux = sweep.evaporation_flux(grid["h"], "water", "air", grid["T"], grid["P"], y_bulk=0.005)
    total = flux.size
    assert max(flux.nbytes / flux.npartitions, grid["T"].nbytes / grid["T"].npartitions) <= 8 * BLOCK_STATES
    with (
        LocalCluster(
            n_workers=workers,
            threads_per_worker=1,
            processes=True,
            memory_limit=MEMORY_LIMIT,
            host="127.0.0.1",
            dashboard_address="127.0.0.1:0",
        ) as cluster,
        Client(cluster) as client,
    ):
        client.run(lambda: sweep.evaporation_flux(20.0, "water", "air", 300.0))  # warm the caches
        start = time.perf_counter()
        # one small task per block reduces it as soon as it is computed (fused with the chain), so
        # no worker ever holds more than the blocks it is working on
        parts = client.compute([dask.delayed(_block_stats)(b) for b in flux.to_delayed().ravel()], sync=True)
        peak = max(p[0] for p in parts)
        mean = sum(p[1] for p in parts) / sum(p[2] for p in parts)
        elapsed = time.perf_counter() - start
        peaks = sorted(client.run(_peak_memory).values())
    assert np.isfinite(peak)
    assert np.isfinite(mean)
    return total / elapsed, peaks, total * 8.0


def main() -> None:
    states = float(sys.argv[1]) if len(sys.argv) > 1 else 1e8
    limit = MEMORY_LIMIT
    rows = []
    base = None
    for workers in (1, 2):
        rate, peaks, result_bytes = run(states, workers)
        base = base or rate
        rows.append((workers, rate, rate / base, peaks, result_bytes))
        print(
            workers, f"{rate:.3g} states/s", [f"{a / 1e6:.0f}/{b / 1e6:.0f} MB" for a, b in peaks], flush=True
        )
    stamp = datetime.date.today().isoformat()
    n_states = rows[0][4] / 8
    lines = [
        f"Measured {stamp} on {platform.machine()}, {os.cpu_count()} cores (shared with other work), "
        f"Python {platform.python_version()}; grid of {n_states:.3g} states (T x h x P) in blocks of "
        f"{BLOCK_STATES} states,",
        "chain h -> k_c -> evaporation flux (water into air), reduced to the maximum and mean flux. "
        f"Materialised, the grid's inputs and result would take {4 * n_states * 8 / 1e9:.1f} GB "
        f"(the result alone {n_states * 8 / 1e9:.1f} GB); each process worker is limited to "
        f"{limit / 1e6:.0f} MB.",
        "",
        "| workers | throughput [states/s] | speed-up vs 1 worker | peak memory per worker, "
        "sampled by its monitor / process high-water mark [MB] |",
        "|---|---|---|---|",
    ]
    for workers, rate, ratio, peaks, _ in rows:
        shown = "; ".join(f"{a / 1e6:.0f} / {b / 1e6:.0f}" for a, b in peaks)
        lines.append(f"| {workers} | {rate:.3g} | {ratio:.2f} | {shown} |")
    text = "\n".join(lines)
    print(text)
    Path(__file__).with_name("sweep.md").write_text(text + "\n", encoding="utf-8")


if __name__ == "__main__":
    main()
