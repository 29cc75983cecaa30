"""Measured diffusivities used to validate the estimation methods.

Each row: (solute, medium, T [K], P [Pa] or None, measured D [m^2/s], source).
Values recalled without the book at hand say "(from memory)".
"""

from __future__ import annotations

ATM = 101325.0

GAS_PAIRS: list[tuple[str, str, float, float, float, str]] = [
    # Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.8
    # (298 K, 1 atm; from memory)
    ("water", "air", 298.0, ATM, 0.26e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("carbon dioxide", "air", 298.0, ATM, 0.16e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("oxygen", "air", 298.0, ATM, 0.21e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("acetone", "air", 298.0, ATM, 0.11e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("benzene", "air", 298.0, ATM, 0.88e-5, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("naphthalene", "air", 298.0, ATM, 0.62e-5, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("argon", "nitrogen", 298.0, ATM, 0.19e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("hydrogen", "oxygen", 298.0, ATM, 0.70e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("hydrogen", "nitrogen", 298.0, ATM, 0.68e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("hydrogen", "carbon dioxide", 298.0, ATM, 0.55e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("carbon dioxide", "nitrogen", 298.0, ATM, 0.16e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("carbon dioxide", "oxygen", 298.0, ATM, 0.14e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    ("oxygen", "nitrogen", 298.0, ATM, 0.18e-4, "Incropera & DeWitt 6th ed. Table A.8 (from memory)"),
    # Coulson & Richardson's Chemical Engineering Vol. 6, ch. 8 (the measured value quoted beside
    # its Fuller example)
    ("methanol", "air", 298.0, ATM, 15.9e-6, "Coulson & Richardson Vol. 6, ch. 8"),
    # Cussler, Diffusion, 3rd ed., Example 5.1-2
    ("hydrogen", "nitrogen", 294.0, 2 * ATM, 0.38e-4, "Cussler, Diffusion, 3rd ed., Example 5.1-2"),
    # Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th ed., Table 11-2 (from memory)
    ("carbon dioxide", "air", 317.2, ATM, 0.177e-4, "Poling et al. 5th ed. Table 11-2 (from memory)"),
    ("ethanol", "air", 313.0, ATM, 0.145e-4, "Poling et al. 5th ed. Table 11-2 (from memory)"),
    ("helium", "air", 317.2, ATM, 0.765e-4, "Poling et al. 5th ed. Table 11-2 (from memory)"),
    ("n-hexane", "air", 328.0, ATM, 0.093e-4, "Poling et al. 5th ed. Table 11-2 (from memory)"),
    ("toluene", "air", 298.9, ATM, 0.086e-4, "Poling et al. 5th ed. Table 11-2 (from memory)"),
    ("water", "air", 313.0, ATM, 0.292e-4, "Poling et al. 5th ed. Table 11-2 (from memory)"),
    ("water", "nitrogen", 308.0, ATM, 0.259e-4, "Poling et al. 5th ed. Table 11-2 (from memory)"),
    ("ammonia", "nitrogen", 298.0, ATM, 0.230e-4, "Poling et al. 5th ed. Table 11-2 (from memory)"),
    ("helium", "nitrogen", 298.0, ATM, 0.687e-4, "Cussler, Diffusion, 3rd ed., Table 5.1-1 (from memory)"),
    # Treybal, Mass-Transfer Operations, 3rd ed., Table 2.1 (from memory)
    ("ethanol", "air", 273.0, ATM, 0.102e-4, "Treybal 3rd ed. Table 2.1 (from memory)"),
]

LIQUID_SYSTEMS: list[tuple[str, str, float, float, str]] = [
    # Poling, Prausnitz & O'Connell, 5th ed., ch. 11 (from memory)
    ("ethylbenzene", "water", 293.0, 0.81e-9, "Poling et al. 5th ed. ch. 11 (from memory)"),
    # Cussler, Diffusion, 3rd ed., Table 5.2-1, dilute in water at 25 C (from memory)
    ("oxygen", "water", 298.15, 2.10e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("carbon dioxide", "water", 298.15, 1.92e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("nitrogen", "water", 298.15, 1.88e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("methane", "water", 298.15, 1.49e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("ethane", "water", 298.15, 1.20e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("propane", "water", 298.15, 0.97e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("benzene", "water", 298.15, 1.02e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("acetic acid", "water", 298.15, 1.21e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("acetone", "water", 298.15, 1.16e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("ammonia", "water", 298.15, 1.64e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
    ("hydrogen", "water", 298.15, 4.50e-9, "Cussler 3rd ed. Table 5.2-1 (from memory)"),
]
