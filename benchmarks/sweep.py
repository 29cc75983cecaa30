"""Sweep benchmark: the h -> k_c -> flux chain over a design grid on a dask.distributed cluster.

Run ``python benchmarks/sweep.py [states]`` (default 2e8 states).  For 1 and 2 process workers
(this machine's cores) it reports the throughput in states per second, its ratio to one worker,
and the peak resident memory of each worker against its memory limit; the grid's result alone
(float64, one value per state) is larger than one worker's limit, so no worker ever holds it:
each computes blocks and keeps only running reductions (maximum and mean flux).  Writes
``benchmarks/sweep.md``.  Like every benchmark here, the ratios are the result, not the times.
"""

from __future__ import annotations

import datetime
import os
import platform
import resource
import sys
import time
from pathlib import Path

import numpy as np
from distributed import Client, LocalCluster

from masstransfer import sweep

MEMORY_LIMIT = "1GiB"


def _peak_rss() -> int:
    return resource.getrusage(resource.RUSAGE_SELF).ru_maxrss * 1024  # Linux reports KiB


def run(states: float, workers: int) -> tuple[float, list[int], float]:
    n_h = 200
    n_p = 5
    n_t = max(2, int(states // (n_h * n_p)))
    grid = sweep.design_grid(
        h=np.linspace(5.0, 200.0, n_h),
        T=np.linspace(280.0, 350.0, n_t),
        P=np.linspace(0.8e5, 2.0e5, n_p),
        block_states=1 << 20,
    )
    flux = sweep.evaporation_flux(grid["h"], "water", "air", grid["T"], grid["P"], y_bulk=0.005)
    total = flux.size
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
        peak, mean = client.compute([flux.max(), flux.mean()], sync=True)
        elapsed = time.perf_counter() - start
        peaks = sorted(client.run(_peak_rss).values())
    assert np.isfinite(peak)
    assert np.isfinite(mean)
    return total / elapsed, peaks, total * 8.0


def main() -> None:
    states = float(sys.argv[1]) if len(sys.argv) > 1 else 2e8
    limit = 1 << 30
    rows = []
    base = None
    for workers in (1, 2):
        rate, peaks, result_bytes = run(states, workers)
        base = base or rate
        rows.append((workers, rate, rate / base, peaks, result_bytes))
        print(workers, f"{rate:.3g} states/s", [f"{p / 2**20:.0f} MiB" for p in peaks], flush=True)
    stamp = datetime.date.today().isoformat()
    lines = [
        f"Measured {stamp} on {platform.machine()}, {os.cpu_count()} cores, "
        f"Python {platform.python_version()}; grid of {rows[0][4] / 8:.3g} states (h x T x P),",
        "chain h -> k_c -> evaporation flux (water into air); the result alone is "
        f"{rows[0][4] / 2**20:.0f} MiB as float64, each process worker is limited to "
        f"{limit / 2**20:.0f} MiB.",
        "",
        "| workers | throughput [states/s] | speed-up vs 1 worker | peak memory per worker [MiB] |",
        "|---|---|---|---|",
    ]
    for workers, rate, ratio, peaks, _ in rows:
        shown = ", ".join(f"{p / 2**20:.0f}" for p in peaks)
        lines.append(f"| {workers} | {rate:.3g} | {ratio:.2f} | {shown} |")
    text = "\n".join(lines)
    print(text)
    Path(__file__).with_name("sweep.md").write_text(text + "\n", encoding="utf-8")


if __name__ == "__main__":
    main()
