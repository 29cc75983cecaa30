"""Print the validation table quoted in the README: each method's deviation from measured data.

Run ``python tests/validation_report.py``.
"""

from __future__ import annotations

import sys
from pathlib import Path

import numpy as np

sys.path.insert(0, str(Path(__file__).parent))

from validation_data import GAS_PAIRS, LIQUID_SYSTEMS

import masstransfer as mt


def main() -> None:
    print(f"Gas pairs: {len(GAS_PAIRS)} measured values at low pressure\n")
    print("| method | AAD | largest deviation |")
    print("|---|---|---|")
    for m in mt.diffusivity.GAS_METHODS:
        dev = np.array([mt.gas_diffusivity(a, b, T, P, method=m) / D - 1 for a, b, T, P, D, _ in GAS_PAIRS])
        print(f"| {m} | {np.mean(np.abs(dev)) * 100:.1f} % | {np.max(np.abs(dev)) * 100:.0f} % |")
    print(f"\nLiquid systems: {len(LIQUID_SYSTEMS)} measured infinite-dilution values\n")
    print("| method | AAD | largest deviation |")
    print("|---|---|---|")
    for m in ("wilke-chang", "hayduk-minhas", "tyn-calus"):
        dev = np.array([mt.liquid_diffusivity(a, b, T, method=m) / D - 1 for a, b, T, D, _ in LIQUID_SYSTEMS])
        print(f"| {m} | {np.mean(np.abs(dev)) * 100:.1f} % | {np.max(np.abs(dev)) * 100:.0f} % |")


if __name__ == "__main__":
    main()
