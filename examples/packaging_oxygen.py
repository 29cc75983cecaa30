"""Oxygen ingress into a sealed snack pouch over its shelf life (all data invented).

Compares two laminates of the same pouch.  Every number here is invented for
the example; food-safety and shelf-life decisions must rest on measured
transmission rates of the actual pack, storage trials and the applicable
regulations.
"""

from __future__ import annotations

import masstransfer as mt
from masstransfer.bodies import Layer, convert_permeability, oxygen_ingress

BARRER = convert_permeability(1.0, "barrer")

# invented laminate data: thickness [m], oxygen permeability at 23 C [barrer]
LAMINATES = {
    "PET 12 um / PE 60 um": [
        Layer(12e-6, permeability=0.03 * BARRER, name="PET"),
        Layer(60e-6, permeability=2.9 * BARRER, name="PE"),
    ],
    "PET 12 um / EVOH 5 um / PE 60 um": [
        Layer(12e-6, permeability=0.03 * BARRER, name="PET"),
        Layer(5e-6, permeability=0.0005 * BARRER, name="EVOH, dry"),
        Layer(60e-6, permeability=2.9 * BARRER, name="PE"),
    ],
}
AREA = 0.045  # m^2 of pouch wall (invented)
LIMIT_MG = 3.0  # mg of O2 the product tolerates (invented)
DAYS = [30, 90, 180, 365]


def main() -> None:
    """Print the ingress over the shelf life for each laminate."""
    print("Oxygen ingress into a sealed pouch (invented data), 23 C, air outside, scavenged inside")
    for name, layers in LAMINATES.items():
        r = oxygen_ingress(AREA, layers, [d * 86400.0 for d in DAYS], T=296.15, limit_mg=LIMIT_MG)
        otr = mt.bodies.convert_permeance(r.permeance, "mol/(m2 s Pa)", "cm3(STP)/(m2 day atm)")
        print(f"\n{name}: OTR {otr:.2f} cm3(STP)/(m2 day atm)")
        for d, mg in zip(DAYS, r.cumulative_mg, strict=True):
            print(f"  after {d:4d} days: {mg:8.2f} mg O2")
        print(f"  reaches {LIMIT_MG} mg after {r.time_to_limit / 86400:.1f} days ({r.assumption})")
    print("\nCaution: an estimate; decisions rest on measured data for the actual pack and regulations.")


if __name__ == "__main__":
    main()
