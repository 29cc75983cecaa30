"""Print the accuracy tables quoted in the README and draw the parity figure.

Run ``python tests/validation_report.py`` (tables to stdout) or
``python tests/validation_report.py --figure docs/validation_parity.png`` (also the figure:
estimated against measured, one marker per method, gases and liquids side by side).

Each method is evaluated on every row it applies to (its record's exclusions, such as Brokaw
with a quantum gas, leave rows out); rows outside a method's class still count, with their
caution silenced here.
"""

from __future__ import annotations

import sys
import warnings
from collections import defaultdict
from pathlib import Path

import numpy as np

sys.path.insert(0, str(Path(__file__).parent))

from validation_data import GAS_PAIRS, LIQUID_SYSTEMS

import masstransfer as mt
from masstransfer.errors import EnvelopeWarning

_LIQUID_METHODS = ("wilke-chang", "hayduk-minhas", "tyn-calus")


def gas_results() -> dict[str, list[tuple[str, float, float]]]:
    """For each gas method (and the default): (set, measured, estimated) per applicable row."""
    out: dict[str, list[tuple[str, float, float]]] = defaultdict(list)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", EnvelopeWarning)
        for a, b, T, P, D, group, _ in GAS_PAIRS:
            avail = {m.method: m.applies for m in mt.diffusivity.available_methods(a, b)}
            for m in (*mt.diffusivity.GAS_METHODS, None):
                if m is None or avail[m]:
                    out[m or "default"].append((group, D, mt.gas_diffusivity(a, b, T, P, method=m)))
    return out


def liquid_results() -> dict[str, list[tuple[str, float, float]]]:
    """For each liquid method (and the default): (set, measured, estimated) per row."""
    out: dict[str, list[tuple[str, float, float]]] = defaultdict(list)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", EnvelopeWarning)
        for a, b, T, D, group, _ in LIQUID_SYSTEMS:
            for m in (*_LIQUID_METHODS, None):
                out[m or "default"].append((group, D, mt.liquid_diffusivity(a, b, T, method=m)))
    return out


def _table(results: dict[str, list[tuple[str, float, float]]]) -> list[str]:
    groups = sorted({g for rows in results.values() for g, _, _ in rows})
    lines = [
        "| method | " + " | ".join(groups) + " | all rows | largest |",
        "|---|" + "---|" * (len(groups) + 2),
    ]
    for m, rows in results.items():
        cells = []
        for g in groups:
            dev = [abs(e / d - 1) for gg, d, e in rows if gg == g]
            cells.append(f"{np.mean(dev) * 100:.1f} % ({len(dev)})" if dev else "-")
        dev_all = [abs(e / d - 1) for _, d, e in rows]
        lines.append(
            f"| {m} | "
            + " | ".join(cells)
            + f" | {np.mean(dev_all) * 100:.1f} % ({len(dev_all)}) | {np.max(dev_all) * 100:.0f} % |"
        )
    return lines


def parity_figure(
    path: Path,
    gas: dict[str, list[tuple[str, float, float]]],
    liquid: dict[str, list[tuple[str, float, float]]],
) -> None:
    """Estimated against measured, one marker per method, gases and liquids side by side."""
    import matplotlib

    matplotlib.use("Agg")
    import matplotlib.pyplot as plt
    from matplotlib.ticker import NullFormatter

    markers = "osD^v<>"
    fig, axes = plt.subplots(1, 2, figsize=(10.0, 4.6))
    for ax, results, scale, unit, title in (
        (axes[0], gas, 1e4, "cm$^2$/s", f"gases at low pressure ({len(GAS_PAIRS)} rows)"),
        (
            axes[1],
            liquid,
            1e9,
            "10$^{-9}$ m$^2$/s",
            f"liquids, infinite dilution ({len(LIQUID_SYSTEMS)} rows)",
        ),
    ):
        lo, hi = np.inf, 0.0
        for (m, rows), mk in zip(
            ((k, v) for k, v in results.items() if k != "default"), markers, strict=False
        ):
            d = np.array([r[1] for r in rows]) * scale
            e = np.array([r[2] for r in rows]) * scale
            lo, hi = min(lo, d.min(), e.min()), max(hi, d.max(), e.max())
            ax.loglog(d, e, mk, ms=5, mfc="none", label=m)
        x = np.array([lo / 1.2, hi * 1.2])
        ax.loglog(x, x, "k-", lw=0.8, label="parity")
        ax.loglog(x, x * 1.2, "k:", lw=0.8, label="±20 %")
        ax.loglog(x, x / 1.2, "k:", lw=0.8)
        for axis in (ax.xaxis, ax.yaxis):
            axis.set_minor_formatter(NullFormatter())
        ax.set_xlabel(f"measured D [{unit}]")
        ax.set_ylabel(f"estimated D [{unit}]")
        ax.set_title(title, fontsize=10)
        ax.legend(fontsize=8)
    fig.suptitle("masstransfer diffusivity estimates against tests/validation_data.py", fontsize=10)
    fig.tight_layout()
    path.parent.mkdir(parents=True, exist_ok=True)
    fig.savefig(path, dpi=110)


def main(argv: list[str]) -> None:
    gas, liquid = gas_results(), liquid_results()
    print(f"Gas pairs: {len(GAS_PAIRS)} measured values at low pressure; AAD (rows) per set\n")
    print("\n".join(_table(gas)))
    print(f"\nLiquid systems: {len(LIQUID_SYSTEMS)} measured infinite-dilution values; AAD (rows) per set\n")
    print("\n".join(_table(liquid)))
    if "--figure" in argv:
        parity_figure(Path(argv[argv.index("--figure") + 1]), gas, liquid)


if __name__ == "__main__":
    main(sys.argv[1:])
