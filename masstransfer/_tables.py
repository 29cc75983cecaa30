"""Published constants used by the estimation methods, each table with its source.

Every table lives here once.  Values are as printed in the cited source; the
unit of each table is stated beside it.  Where a value was transcribed from
the cited book without the book at hand it says "(from memory)", so that a
reader can check it against the page.
"""

from __future__ import annotations

from types import MappingProxyType
from typing import Final

__all__ = [
    "AIR",
    "FULLER_ATOMIC_VOLUMES",
    "FULLER_RING_INCREMENT",
    "FULLER_SPECIAL_VOLUMES",
    "LE_BAS_ATOMIC_VOLUMES",
    "LE_BAS_RING_INCREMENTS",
    "LIMITING_ION_DIFFUSIVITY",
    "QUAYLE_PARACHOR_ATOMS",
    "QUAYLE_PARACHOR_BONDS",
    "QUAYLE_PARACHOR_RINGS",
    "SMALL_MOLECULE_VB",
    "STRONG_ACIDS",
    "WILKE_CHANG_ASSOCIATION",
]

# --- Fuller, Schettler & Giddings diffusion volumes -----------------------
# Set published by Fuller, Ensley & Giddings (1969), J. Phys. Chem. 73, 3679,
# as tabulated in Poling, Prausnitz & O'Connell, The Properties of Gases and
# Liquids, 5th ed. (2001), Table 11-1 (from memory).  Unit: cm^3/mol (the
# method's nominal unit; the numbers are fitted parameters).
FULLER_ATOMIC_VOLUMES: Final = MappingProxyType(
    {
        "C": 15.9,
        "H": 2.31,
        "O": 6.11,
        "N": 4.54,
        "F": 14.7,
        "Cl": 21.0,
        "Br": 21.9,
        "I": 29.8,
        "S": 22.9,
    }
)
#: Increment per aromatic or heterocyclic ring, same source.  The table gives
#: no increment for saturated carbocyclic rings; none is applied to them.
FULLER_RING_INCREMENT: Final = -18.3

# Diffusion volumes of simple molecules, same source, keyed by CAS number.
FULLER_SPECIAL_VOLUMES: Final = MappingProxyType(
    {
        "7440-59-7": 2.67,  # He
        "7440-01-9": 5.98,  # Ne
        "7440-37-1": 16.2,  # Ar
        "7439-90-9": 24.5,  # Kr
        "7440-63-3": 32.7,  # Xe
        "1333-74-0": 6.12,  # H2
        "7782-39-0": 6.84,  # D2
        "7727-37-9": 18.5,  # N2
        "7782-44-7": 16.3,  # O2
        "air": 19.7,  # air (pseudo-species)
        "630-08-0": 18.0,  # CO
        "124-38-9": 26.9,  # CO2
        "10024-97-2": 35.9,  # N2O
        "7664-41-7": 20.7,  # NH3
        "7732-18-5": 13.1,  # H2O
        "2551-62-4": 71.3,  # SF6
        "7782-50-5": 38.4,  # Cl2
        "7726-95-6": 69.0,  # Br2
        "7446-09-5": 41.8,  # SO2
    }
)

# --- Le Bas additive molar volumes at the normal boiling point ------------
# Le Bas (1915), The Molecular Volumes of Liquid Chemical Compounds, as
# tabulated in Reid, Prausnitz & Sherwood, The Properties of Gases and
# Liquids, 3rd ed. (1977), Table 3-8, and in Treybal, Mass-Transfer
# Operations, 3rd ed. (1980), Table 2.3 (from memory).  Unit: cm^3/mol.
LE_BAS_ATOMIC_VOLUMES: Final = MappingProxyType(
    {
        "C": 14.8,
        "H": 3.7,
        "O": 7.4,  # general (carbonyl, hydroxyl of alcohols)
        "O_methyl_ether": 9.1,  # in methyl esters and ethers
        "O_ethyl_ether": 9.9,  # in ethyl esters and ethers
        "O_higher_ether": 11.0,  # in higher esters and ethers
        "O_acid": 12.0,  # in carboxylic acids
        "O_to_SPN": 8.3,  # joined to S, P or N
        "N": 15.6,  # double- or triple-bonded
        "N_primary_amine": 10.5,
        "N_secondary_amine": 12.0,
        "Br": 27.0,
        "Cl": 24.6,
        "F": 8.7,
        "I": 37.0,
        "S": 25.6,
        "P": 27.0,
    }
)
#: Ring increments by ring size, same source (naphthalene -30.0 is two
#: six-membered rings; anthracene's tabulated -47.5 is approximated as three).
LE_BAS_RING_INCREMENTS: Final = MappingProxyType({3: -6.0, 4: -8.5, 5: -11.5, 6: -15.0})

# --- Molar volumes of small molecules at their normal boiling point ------
# The tabulated values the liquid-diffusivity correlations and the Wilke-Lee
# and Brokaw estimates were built with: Treybal, Mass-Transfer Operations,
# 3rd ed. (1980), Table 2.3, the same values as Welty, Wicks & Wilson,
# Fundamentals of Momentum, Heat and Mass Transfer, Table 24.5 (from memory).
# Used in place of a liquid-model value (for CO2, which has no liquid at
# 1 atm, the tabulated value is the only meaningful one).  Keyed by CAS;
# unit: m^3/mol.
SMALL_MOLECULE_VB: Final = MappingProxyType(
    {
        "1333-74-0": 14.3e-6,  # H2
        "7782-44-7": 25.6e-6,  # O2
        "7727-37-9": 31.2e-6,  # N2
        "630-08-0": 30.7e-6,  # CO
        "124-38-9": 34.0e-6,  # CO2
        "7446-09-5": 44.8e-6,  # SO2
        "10102-43-9": 23.6e-6,  # NO
        "10024-97-2": 36.4e-6,  # N2O
        "7664-41-7": 25.8e-6,  # NH3
        "7732-18-5": 18.9e-6,  # H2O
        "7783-06-4": 32.9e-6,  # H2S
        "463-58-1": 51.5e-6,  # COS
        "7782-50-5": 48.4e-6,  # Cl2
        "7726-95-6": 53.2e-6,  # Br2
        "7553-56-2": 71.5e-6,  # I2
    }
)

# --- Wilke-Chang association factors --------------------------------------
# Wilke & Chang (1955), AIChE J. 1, 264; as given in Poling, Prausnitz &
# O'Connell, 5th ed. (2001), Section 11-9 (from memory).  Keyed by CAS.
# Unassociated solvents take 1.0.  Hayduk & Laudie (1974) recommend 2.26 for
# water; the original 2.6 is kept as the default.
WILKE_CHANG_ASSOCIATION: Final = MappingProxyType(
    {
        "7732-18-5": 2.6,  # water
        "67-56-1": 1.9,  # methanol
        "64-17-5": 1.5,  # ethanol
    }
)

# --- Air as a pseudo-species ------------------------------------------------
# Molar mass and composition: Lemmon, Jacobsen, Penoncello & Friend (2000),
# J. Phys. Chem. Ref. Data 29, 331 (from memory).  Lennard-Jones parameters:
# Svehla (1962), NASA TR R-132, as reprinted in Poling, Prausnitz & O'Connell
# 5th ed., Appendix B (from memory).  Molar volume at the normal boiling
# point: Treybal, 3rd ed., Table 2.3 (from memory).  SI units.
AIR: Final = MappingProxyType(
    {
        "molar_mass": 0.0289586,  # kg/mol
        "Tb": 78.9,  # K (dew point at 1 atm)
        "Tc": 132.5306,  # K (critical point of the pseudo-pure fluid)
        "Pc": 3.786e6,  # Pa
        "omega": 0.0335,  # [-]
        "sigma": 3.711e-10,  # m
        "epsilon_k": 78.6,  # K
        "Vb": 29.9e-6,  # m^3/mol
        "dipole": 0.0,  # C m
        # Mole fractions used for carrier-gas properties (CAS -> fraction).
        "composition": (("7727-37-9", 0.7812), ("7782-44-7", 0.2096), ("7440-37-1", 0.0092)),
    }
)

# --- Parachor structural contributions ---------------------------------------
# Quayle, O. R. (1953), Chem. Rev. 53, 439-589, as tabulated in Poling, Prausnitz &
# O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), Section 12-3 (from memory).
# Unit: cm^3 g^0.25 s^-0.5 mol^-1 (the tabulated cgs form; divide by 5.623413e6 for SI).
QUAYLE_PARACHOR_ATOMS: Final = MappingProxyType(
    {
        "C": 9.0,
        "H": 15.5,
        "O": 20.0,
        "N": 17.5,
        "S": 49.1,
        "P": 40.5,
        "F": 26.1,
        "Cl": 55.2,
        "Br": 68.0,
        "I": 90.3,
    }
)
QUAYLE_PARACHOR_BONDS: Final = MappingProxyType(
    {
        "double_terminal": 19.1,  # ethylenic bond at the end of a chain; also used for aromatic rings
        "double_internal": 17.7,  # ethylenic bond in the 2,3-position
        "triple": 40.6,
        "semipolar": -1.6,  # S=O, P=O as written in SMILES (a semipolar bond)
        "ester_O2": 60.0,  # both oxygens of -COO- in esters (instead of 2 x 20.0)
        "COOH": 73.8,  # the whole carboxylic acid group
        "NO2": 74.1,  # the whole nitro group
    }
)
#: Ring-closure increments by ring size, same source.
QUAYLE_PARACHOR_RINGS: Final = MappingProxyType({3: 12.5, 4: 6.0, 5: 3.0, 6: 0.8, 7: 4.0})

# --- Packings for gas-liquid contactors ---------------------------------------
# One row per packing: kind, nominal size [m], material, specific area a [m^2/m^3], void
# fraction [-], critical surface tension of the material sigma_c [N/m] (Onda, Takeuchi &
# Okumoto 1968, J. Chem. Eng. Japan 1, 56, Table 1: ceramic 0.061, steel 0.075, polyethylene
# 0.033, carbon 0.056, glass 0.073 N/m (from memory)), Billet & Schultes constants
# C_L, C_V, C_h, C_S (Billet & Schultes 1999, Chem. Eng. Technol. 22, 1, Table 1, and
# Billet, Packed Towers, VCH 1995, Table 2 (from memory); None where not recalled), and the
# corrugation geometry of structured packings for Bravo, Rocha & Fair (1985): side S, base B,
# crimp height h [m] and flow-channel angle theta [deg] from the horizontal (Rocha, Bravo &
# Fair 1996, Ind. Eng. Chem. Res. 35, 1660, Table 1 (from memory)).
PACKING_DATA: Final = MappingProxyType(
    {
        "pall-ring-metal-25": {
            "kind": "random",
            "nominal_size": 0.025,
            "material": "steel",
            "a": 223.5,
            "void_fraction": 0.954,
            "sigma_c": 0.075,
            "C_L": 1.440,
            "C_V": 0.336,
            "C_h": 0.719,
            "C_S": 2.627,
            "source": (
                "Billet & Schultes (1999) Table 1 (from memory); sigma_c: Onda et al. (1968) (from memory)"
            ),
        },
        "pall-ring-metal-50": {
            "kind": "random",
            "nominal_size": 0.050,
            "material": "steel",
            "a": 112.6,
            "void_fraction": 0.951,
            "sigma_c": 0.075,
            "C_L": 1.192,
            "C_V": 0.410,
            "C_h": 0.784,
            "C_S": 2.725,
            "source": (
                "Billet & Schultes (1999) Table 1 (from memory); sigma_c: Onda et al. (1968) (from memory)"
            ),
        },
        "pall-ring-plastic-25": {
            "kind": "random",
            "nominal_size": 0.025,
            "material": "polyolefin",
            "a": 225.0,
            "void_fraction": 0.887,
            "sigma_c": 0.033,
            "C_L": 0.905,
            "C_V": 0.446,
            "C_h": 0.528,
            "C_S": 2.696,
            "source": (
                "Billet & Schultes (1999) Table 1 (from memory); sigma_c: Onda et al. (1968) value "
                "for polyethylene (from memory)"
            ),
        },
        "pall-ring-plastic-50": {
            "kind": "random",
            "nominal_size": 0.050,
            "material": "polyolefin",
            "a": 111.1,
            "void_fraction": 0.919,
            "sigma_c": 0.033,
            "C_L": 1.239,
            "C_V": 0.368,
            "C_h": 0.593,
            "C_S": 2.816,
            "source": (
                "Billet & Schultes (1999) Table 1 (from memory); sigma_c: Onda et al. (1968) value "
                "for polyethylene (from memory)"
            ),
        },
        "raschig-ring-ceramic-25": {
            "kind": "random",
            "nominal_size": 0.025,
            "material": "ceramic",
            "a": 190.0,
            "void_fraction": 0.680,
            "sigma_c": 0.061,
            "C_L": 1.361,
            "C_V": 0.412,
            "C_h": None,
            "C_S": None,
            "source": (
                "Billet & Schultes (1999) Table 1 (from memory); sigma_c: Onda et al. (1968) (from memory)"
            ),
        },
        "berl-saddle-ceramic-25": {
            "kind": "random",
            "nominal_size": 0.025,
            "material": "ceramic",
            "a": 260.0,
            "void_fraction": 0.680,
            "sigma_c": 0.061,
            "C_L": 1.246,
            "C_V": 0.387,
            "C_h": None,
            "C_S": None,
            "source": (
                "a and void fraction: Billet's table as reprinted in Kolev, Packed Bed Columns for "
                "Absorption, Desorption, Rectification and Direct Heat Transfer (Elsevier 2006), "
                "Ch. 4, Table 1; C_L, C_V: Billet & Schultes (1999) Table 1 (from memory); sigma_c: "
                "Onda et al. (1968) (from memory)"
            ),
        },
        "raschig-ring-ceramic-13": {
            "kind": "random",
            "nominal_size": 0.0127,
            "material": "ceramic",
            "a": 370.0,
            "void_fraction": 0.64,
            "sigma_c": 0.061,
            "C_L": None,
            "C_V": None,
            "C_h": None,
            "C_S": None,
            "source": (
                "Treybal, Mass-Transfer Operations, 3rd ed. (1980), Table 6.3, 1/2 in ceramic Raschig "
                "rings (from memory); sigma_c: Onda et al. (1968) (from memory)"
            ),
        },
        "mellapak-250y": {
            "kind": "structured",
            "nominal_size": 0.0119,
            "material": "steel",
            "a": 250.0,
            "void_fraction": 0.970,
            "sigma_c": 0.075,
            "C_L": None,
            "C_V": None,
            "C_h": 0.554,
            "C_S": 3.157,
            "S": 0.0171,
            "B": 0.0241,
            "h": 0.0119,
            "theta": 45.0,
            "source": (
                "a, void fraction, C_h, C_S: Billet & Schultes (1999) Table 1 (from memory); geometry: "
                "Rocha, Bravo & Fair (1996) Table 1 (from memory); nominal size: the crimp height"
            ),
        },
        "gauze-bx": {
            "kind": "structured",
            "nominal_size": 0.0064,
            "material": "steel gauze",
            "a": 492.0,
            "void_fraction": 0.90,
            "sigma_c": 0.075,
            "C_L": None,
            "C_V": None,
            "C_h": None,
            "C_S": None,
            "S": 0.0089,
            "B": 0.0127,
            "h": 0.0064,
            "theta": 60.0,
            "source": (
                "Bravo, Rocha & Fair (1985), Hydrocarbon Processing 64(1), 91, Table 1 (from memory); "
                "nominal size: the crimp height"
            ),
        },
    }
)

# --- Limiting ionic diffusivities in water at 25 C ------------------------------
# D of each ion at infinite dilution in water at 298.15 K, D = (RT/F^2) lambda/|z| from its
# limiting ionic conductivity lambda per equivalent (of 1/2 Ca2+, for example).  Source:
# P. Vanysek, "Ionic conductivity and diffusion at infinite dilution", CRC Handbook of
# Chemistry and Physics, 86th ed. (2005), Section 5
# (values compiled from Robinson & Stokes, Electrolyte Solutions, 2nd ed. 1959, and others).
# "read" means the value was read from that table; "(from memory)" that it was recalled, with
# a second printed value beside it where one was read: Kirk, The Biogeochemistry of Submerged
# Soils (2004), Table 2.3 (two to three digits, from Landolt-Bornstein 1960 and Robinson &
# Stokes 1959).  Key: ion label -> (charge number, atoms as (element, count) pairs, D [m^2/s]).
LIMITING_ION_DIFFUSIVITY: Final = MappingProxyType(
    {
        "H+": (1, (("H", 1),), 9.311e-9),  # CRC 86th ed. Sec. 5 (read)
        "Li+": (1, (("Li", 1),), 1.029e-9),  # CRC 86th ed. Sec. 5 (read)
        "Na+": (1, (("Na", 1),), 1.334e-9),  # CRC 86th ed. (from memory); Kirk Table 2.3: 1.33
        "K+": (1, (("K", 1),), 1.957e-9),  # CRC 86th ed. Sec. 5 (read)
        "Cs+": (1, (("Cs", 1),), 2.056e-9),  # CRC 86th ed. Sec. 5 (read)
        "NH4+": (1, (("N", 1), ("H", 4)), 1.957e-9),  # CRC 86th ed. Sec. 5 (read)
        "Mg2+": (2, (("Mg", 1),), 0.706e-9),  # CRC 86th ed. Sec. 5 (read)
        "Ca2+": (2, (("Ca", 1),), 0.792e-9),  # CRC 86th ed. Sec. 5 (read)
        "Sr2+": (2, (("Sr", 1),), 0.791e-9),  # CRC 86th ed. (from memory); Kirk Table 2.3: 0.79
        "Ba2+": (2, (("Ba", 1),), 0.847e-9),  # CRC 86th ed. Sec. 5 (read)
        "OH-": (-1, (("O", 1), ("H", 1)), 5.273e-9),  # CRC 86th ed. (from memory); Kirk: 5.27
        "F-": (-1, (("F", 1),), 1.475e-9),  # CRC 86th ed. (from memory); Kirk Table 2.3: 1.47
        "Cl-": (-1, (("Cl", 1),), 2.032e-9),  # CRC 86th ed. (from memory); Kirk Table 2.3: 2.03
        "Br-": (-1, (("Br", 1),), 2.080e-9),  # CRC 86th ed. (from memory); Kirk Table 2.3: 2.08
        "I-": (-1, (("I", 1),), 2.045e-9),  # CRC 86th ed. (from memory); Kirk Table 2.3: 2.04
        "NO3-": (-1, (("N", 1), ("O", 3)), 1.902e-9),  # CRC 86th ed. (from memory); Kirk: 1.90
        "ClO4-": (-1, (("Cl", 1), ("O", 4)), 1.792e-9),  # CRC 86th ed. (from memory)
        "HCO3-": (-1, (("H", 1), ("C", 1), ("O", 3)), 1.185e-9),  # CRC 86th (from memory); Kirk: 1.18
        "CO3 2-": (-2, (("C", 1), ("O", 3)), 0.923e-9),  # CRC 86th ed. (from memory); Kirk: 0.92
        "SO4 2-": (-2, (("S", 1), ("O", 4)), 1.065e-9),  # CRC 86th ed. (from memory); Kirk: 1.06
        "HCOO-": (-1, (("H", 1), ("C", 1), ("O", 2)), 1.454e-9),  # CRC 86th (from memory); Kirk: 1.45
        "CH3COO-": (-1, (("C", 2), ("H", 3), ("O", 2)), 1.089e-9),  # CRC 86th (from memory); Kirk: 1.09
    }
)

#: Strong mineral acids, keyed by CAS: fully dissociated in dilute water, though written as
#: neutral molecules (common practice; HCl, HBr, HI, HNO3, HClO4; H2SO4 is taken as 2 H+ + SO4 2-,
#: though its second dissociation is incomplete, pKa about 2, common practice).
STRONG_ACIDS: Final = frozenset(
    {"7647-01-0", "10035-10-6", "10034-85-2", "7697-37-2", "7664-93-9", "7601-90-3"}
)
