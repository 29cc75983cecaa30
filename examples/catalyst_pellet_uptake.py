"""Uptake of a reactant vapour by spherical adsorbent pellets (all data invented).

From a gas-side heat-transfer coefficient to the film coefficient (analogy), the
mass Biot number, and the uptake curve with and without the film resistance.
"""

from __future__ import annotations

import numpy as np

import masstransfer as mt
from masstransfer.bodies import fractional_uptake, half_time

R_PELLET = 1.5e-3  # m, pellet radius (invented)
D_EFF = 2e-8  # m^2/s, effective pore diffusivity of the vapour in the pellet (invented)
PARTITION = 40.0  # adsorbed / gas-phase concentration at equilibrium (invented)
H_GAS = 60.0  # W/(m^2 K), gas-to-pellet heat-transfer coefficient (invented)


def main() -> None:
    """Print the film coefficient, Biot number and uptake curves."""
    res = mt.mass_transfer_from_heat(H_GAS, "toluene", "nitrogen", 330.0)
    biot = float(res.k_c) * R_PELLET / (PARTITION * D_EFF)
    print("Toluene uptake by adsorbent pellets (invented data)")
    print(f"  film coefficient from h = {H_GAS} W/(m^2 K): k_c = {float(res.k_c):.4f} m/s")
    print(f"  Schmidt number of toluene in nitrogen: {float(res.Sc):.2f}")
    print(f"  mass Biot number k_c R / (K D_eff) = {biot:.2f}")
    print(f"  half-time without film resistance: {float(half_time('sphere', D_EFF, R_PELLET)):.1f} s")
    t = np.array([1.0, 5.0, 20.0, 60.0, 300.0])
    free = np.asarray(fractional_uptake("sphere", t, D_EFF, R_PELLET))
    film = np.asarray(fractional_uptake("sphere", t, D_EFF, R_PELLET, biot=biot))
    print("  t [s]        " + "  ".join(f"{x:6.0f}" for x in t))
    print("  no film      " + "  ".join(f"{x:6.3f}" for x in free))
    print("  with film    " + "  ".join(f"{x:6.3f}" for x in film))


if __name__ == "__main__":
    main()
