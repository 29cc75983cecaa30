"""Measured diffusivities used to validate the estimation methods.

Gas rows: (solute, medium, T [K], P [Pa], measured D [m^2/s], set, source).
Liquid rows: (solute, solvent, T [K], measured D [m^2/s], set, source).

Each row was checked against the source it names for temperature, pressure basis and units.
Values read from a copy of the source found on the web say where; values recalled without the
source at hand say "(from memory)".

Rows left out on purpose:

* naphthalene-air (Incropera & DeWitt Table A.8, 300 K): published values differ by about 35 %
  between sources, which cannot test a 5 % method;
* methanol-air at 298 K (quoted beside a Fuller example in Coulson & Richardson Vol. 6): the
  number equals a Fuller estimate, not a measurement;
* ammonia-air at 298 K, 0.28 cm^2/s (Incropera Table A.8, from memory): Welty's 0.198 cm^2/s at
  273 K, read, scales to about 0.23 at 298 K; the Welty row is kept;
* water in n-hexadecane: Su et al. (J. Chem. Phys. 132, 044506, 2010) give 1.15e-5 cm^2/s, about
  a quarter of the 4.2e-5 cm^2/s of Schatzberg (J. Polym. Sci. C 10, 87, 1965; from memory).  Two
  sources a factor of about 3.6 apart cannot test a method (Hayduk-Minhas's n-paraffin form gives
  5.4e-5 cm^2/s, Wilke-Chang 0.8e-5, Tyn-Calus 0.66e-5);
* solutes in squalane, pristane and isocetane (Kowert, J. Phys. Chem. B 2011 and 2018): the liquid
  viscosity models of these branched alkanes give 0.5-0.7 mPa s at 298 K, against about 30 mPa s
  measured for squalane at 296 K (Kowert 2011, abstract), so the rows would test the property
  model, not the diffusivity methods.

The viscous-solvent set is small: three rows could be read from a source at hand, water in
1-octanol (7.3 mPa s), oxygen in 1,2-propanediol (about 49 mPa s at 295.65 K) and water in glycerol
(about 1000 mPa s).  The last two lie beyond the 20 mPa s up to which the correlations were
fitted, where they warn.  Ethylene glycol (about 16 mPa s at 25 C, from memory), below that
limit, and heavier alcohols are still missing.  Near misses, not used: oxygen in glycerol-water
up to 92.5 % by mass glycerol (Jordan et al., J. Am. Chem. Soc. 1956, as transcribed in the
repository named at NOGAMI below) is not a pure solvent; solutes in squalane are left out for the
reason above.
"""

from __future__ import annotations

ATM = 101325.0
BAR = 1.0e5

#: CRC Handbook of Chemistry and Physics, table "Diffusion in gases" (from Marrero & Mason 1972,
#: J. Phys. Chem. Ref. Data 1, 3), p = 101.325 kPa; air rows are for a gas in a large excess of
#: air, the others equimolar.  Read from a reproduction of the table (zanotowane.pl/1014/7325).
CRC = "CRC Handbook, 'Diffusion in gases' (Marrero & Mason 1972), 101.325 kPa"
#: Perry's Chemical Engineers' Handbook, Table 2-371 "Diffusivities of pairs of gases and
#: vapors (1 atm)", 7th ed. (the same table is 2-324 in the 8th ed.); the air and H2 columns only
#: (rows where the column is unambiguous).  Read from a reproduction of the table (scribd.com
#: document 572279144).
PERRY = "Perry's 7th ed. Table 2-371 (1 atm)"
INCROPERA = "Incropera & DeWitt, 6th ed., Table A.8, 1 atm (from memory)"
#: Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., Table 17.1-1, 1 atm (values from
#: Hirschfelder, Curtiss & Bird 1964; water and ammonia pairs from Reid, Prausnitz & Poling 4th
#: ed.; hydrocarbon pairs from Gotoh et al. 1974).  Read from a reproduction of the page
#: (digilib.universitaspertamina.ac.id, Transport Phenomena, page 537).
BSL = "Bird, Stewart & Lightfoot 2nd ed. Table 17.1-1 (1 atm)"
#: Welty, Wicks & Wilson, Fundamentals of Momentum, Heat and Mass Transfer, 3rd ed. (1984), as
#: reprinted in Benitez, Principles and Modern Applications of Mass Transfer Operations, Appendix
#: Table A.1, which lists D*P in m^2 Pa/s (divided here by 101325 Pa for D at 1 atm).  Read from a
#: reproduction of the appendix (scribd.com document 379518623).
WELTY = "Welty, Wicks & Wilson 3rd ed., via Benitez Table A.1 (D*P)"
#: Welty, Wicks, Wilson & Rorrer, Fundamentals of Momentum, Heat and Mass Transfer, Appendix J,
#: Table J.1 "Binary mass diffusivities in gases" (after Reid & Sherwood 1966), D*P in
#: cm^2 atm/s (divided here by 1 atm).  Read from a reproduction of its pages 691-692
#: (scribd.com document 357993864), which does not show the edition; its rows shared with
#: Benitez Table A.1 (WELTY above) carry the same numbers.
WELTY_J = "Welty et al., Appendix J Table J.1 (D*P, cm^2 atm/s)"
#: Poling, Prausnitz & O'Connell 5th ed. Table 11-2 lists D*P in bar cm^2/s: rows at P = 1 bar.
POLING = "Poling et al. 5th ed. Table 11-2, D*P at 1 bar (from memory)"

GAS_PAIRS: list[tuple[str, str, float, float, float, str, str]] = [
    # --- permanent gases (CRC) ---
    ("argon", "air", 273.15, ATM, 0.167e-4, "permanent gases", CRC),
    ("argon", "air", 293.15, ATM, 0.189e-4, "permanent gases", CRC),
    ("methane", "air", 293.15, ATM, 0.210e-4, "permanent gases", CRC),
    ("carbon monoxide", "air", 293.15, ATM, 0.208e-4, "permanent gases", CRC),
    ("carbon dioxide", "air", 293.15, ATM, 0.160e-4, "permanent gases", CRC),
    ("carbon dioxide", "air", 373.15, ATM, 0.252e-4, "permanent gases", CRC),
    ("hydrogen", "air", 293.15, ATM, 0.756e-4, "permanent gases", CRC),
    ("helium", "air", 293.15, ATM, 0.697e-4, "permanent gases", CRC),
    ("argon", "carbon dioxide", 293.15, ATM, 0.148e-4, "permanent gases", CRC),
    ("argon", "hydrogen", 293.15, ATM, 0.794e-4, "permanent gases", CRC),
    ("argon", "helium", 293.15, ATM, 0.726e-4, "permanent gases", CRC),
    ("argon", "nitrogen", 293.15, ATM, 0.190e-4, "permanent gases", CRC),
    ("argon", "oxygen", 293.15, ATM, 0.187e-4, "permanent gases", CRC),
    ("methane", "hydrogen", 293.15, ATM, 0.708e-4, "permanent gases", CRC),
    ("methane", "helium", 293.15, ATM, 0.650e-4, "permanent gases", CRC),
    ("methane", "nitrogen", 293.15, ATM, 0.208e-4, "permanent gases", CRC),
    ("methane", "oxygen", 293.15, ATM, 0.220e-4, "permanent gases", CRC),
    # Incropera Table A.8 (at 273 K or 293 K, not 298 K): its H2-O2, H2-N2, O2-N2, water-air and
    # benzene-air rows are left out as duplicates of values read from Welty and BSL below (the
    # first four agree with them within 1.5 %; benzene-air, 0.088 cm^2/s, is 9 % below Welty's);
    # H2-CO2 and CO2-O2 are taken from the sources read instead (Welty: 0.550; Perry: 0.139).
    ("carbon dioxide", "hydrogen", 273.0, ATM, 5.572 / ATM, "permanent gases", WELTY),
    # Perry's CO2 row reads .138 .550 .139 0.096 0.153 with blank columns: .139 is taken as the O2
    # column since 0.096 (N2O) and 0.153 (CH4) match BSL and Welty, and Incropera gives 0.14
    ("carbon dioxide", "oxygen", 273.15, ATM, 0.139e-4, "permanent gases", PERRY),
    # between BSL's CO2-N2 values at 288.2 K (0.158) and 298.2 K (0.165) below
    ("carbon dioxide", "nitrogen", 293.0, ATM, 0.16e-4, "permanent gases", INCROPERA),
    # H2-N2 again, at 294 K and 2 atm: consistent with BSL's 273.2 K row below by T^1.75/P
    (
        "hydrogen",
        "nitrogen",
        294.0,
        2 * ATM,
        0.38e-4,
        "permanent gases",
        "Cussler, Diffusion, 3rd ed., Example 5.1-2 (from memory)",
    ),
    ("carbon dioxide", "nitrous oxide", 273.2, ATM, 0.096e-4, "permanent gases", BSL),
    ("carbon dioxide", "carbon monoxide", 273.2, ATM, 0.139e-4, "permanent gases", BSL),
    ("carbon dioxide", "nitrogen", 273.2, ATM, 0.144e-4, "permanent gases", BSL),
    ("carbon dioxide", "nitrogen", 288.2, ATM, 0.158e-4, "permanent gases", BSL),
    ("carbon dioxide", "nitrogen", 298.2, ATM, 0.165e-4, "permanent gases", BSL),
    ("nitrogen", "oxygen", 273.2, ATM, 0.181e-4, "permanent gases", BSL),
    ("hydrogen", "sulfur hexafluoride", 298.2, ATM, 0.420e-4, "permanent gases", BSL),
    ("hydrogen", "methane", 298.2, ATM, 0.726e-4, "permanent gases", BSL),
    ("hydrogen", "nitrogen", 273.2, ATM, 0.674e-4, "permanent gases", BSL),
    ("carbon dioxide", "air", 317.2, BAR, 0.177e-4, "permanent gases", POLING),
    ("helium", "air", 317.2, BAR, 0.765e-4, "permanent gases", POLING),
    # --- water and polar inorganic vapours ---
    ("water", "air", 293.15, ATM, 0.242e-4, "polar vapours", CRC),
    ("water", "air", 373.15, ATM, 0.399e-4, "polar vapours", CRC),
    # Incropera's ammonia-air, 0.28 cm^2/s at 298 K (from memory), is left out: Welty's 0.198
    # at 273 K (read, below) scales to about 0.23 at 298 K.
    ("ammonia", "air", 273.0, ATM, 2.006 / ATM, "polar vapours", WELTY),
    ("water", "air", 313.0, BAR, 0.292e-4, "polar vapours", POLING),
    ("water", "nitrogen", 308.0, ATM, 0.259e-4, "polar vapours", BSL),
    ("water", "oxygen", 352.0, ATM, 0.357e-4, "polar vapours", BSL),
    ("ammonia", "nitrogen", 298.0, ATM, 0.233e-4, "polar vapours", BSL),
    ("ammonia", "hydrogen", 263.0, ATM, 0.58e-4, "polar vapours", BSL),
    # --- organic vapours in air and hydrogen ---
    ("acetic acid", "air", 273.15, ATM, 0.1064e-4, "organic vapours", PERRY),
    ("acetone", "air", 273.15, ATM, 0.109e-4, "organic vapours", PERRY),
    ("benzene", "air", 273.15, ATM, 0.077e-4, "organic vapours", PERRY),
    ("1-butanol", "air", 273.15, ATM, 0.0703e-4, "organic vapours", PERRY),
    ("1-butanol", "air", 303.15, ATM, 0.088e-4, "organic vapours", PERRY),
    ("2-methyl-1-propanol", "air", 273.15, ATM, 0.0727e-4, "organic vapours", PERRY),
    ("n-butyl acetate", "air", 273.15, ATM, 0.058e-4, "organic vapours", PERRY),
    ("butyric acid", "air", 273.15, ATM, 0.067e-4, "organic vapours", PERRY),
    ("carbon disulfide", "air", 273.15, ATM, 0.0892e-4, "organic vapours", PERRY),
    ("chloroform", "air", 273.15, ATM, 0.091e-4, "organic vapours", PERRY),
    ("chlorobenzene", "air", 303.15, ATM, 0.075e-4, "organic vapours", PERRY),
    ("aniline", "air", 303.15, ATM, 0.075e-4, "organic vapours", PERRY),
    ("diethylamine", "air", 273.15, ATM, 0.0884e-4, "organic vapours", PERRY),
    ("diethyl ether", "air", 273.15, ATM, 0.0778e-4, "organic vapours", PERRY),
    ("ethyl acetate", "air", 273.15, ATM, 0.0715e-4, "organic vapours", PERRY),
    ("ethyl acetate", "air", 303.15, ATM, 0.089e-4, "organic vapours", PERRY),
    ("ethanol", "air", 273.15, ATM, 0.102e-4, "organic vapours", PERRY),
    ("ethylbenzene", "air", 273.15, ATM, 0.0658e-4, "organic vapours", PERRY),
    ("acetic acid", "hydrogen", 273.15, ATM, 0.416e-4, "organic vapours", PERRY),
    ("benzene", "hydrogen", 273.15, ATM, 0.306e-4, "organic vapours", PERRY),
    ("ethanol", "hydrogen", 273.15, ATM, 0.375e-4, "organic vapours", PERRY),
    ("ethanol", "air", 313.0, BAR, 0.145e-4, "organic vapours", POLING),
    ("n-hexane", "air", 328.0, BAR, 0.093e-4, "organic vapours", POLING),
    ("toluene", "air", 298.9, BAR, 0.086e-4, "organic vapours", POLING),
    ("benzene", "air", 298.0, ATM, 0.974 / ATM, "organic vapours", WELTY),
    ("toluene", "air", 298.0, ATM, 0.855 / ATM, "organic vapours", WELTY),
    ("ethanol", "air", 298.0, ATM, 1.337 / ATM, "organic vapours", WELTY),
    ("methanol", "air", 298.0, ATM, 1.641 / ATM, "organic vapours", WELTY),
    ("n-octane", "air", 298.0, ATM, 0.610 / ATM, "organic vapours", WELTY),
    ("nitrobenzene", "air", 298.0, ATM, 0.879 / ATM, "organic vapours", WELTY),
    ("n-propyl acetate", "air", 315.0, ATM, 0.932 / ATM, "organic vapours", WELTY),
    ("diethyl ether", "air", 293.0, ATM, 0.908 / ATM, "organic vapours", WELTY),
    ("ethanol", "carbon dioxide", 273.0, ATM, 0.702 / ATM, "organic vapours", WELTY),
    ("benzene", "carbon dioxide", 318.0, ATM, 0.724 / ATM, "organic vapours", WELTY),
    ("ethyl acetate", "carbon dioxide", 319.0, ATM, 0.675 / ATM, "organic vapours", WELTY),
    ("benzene", "hydrogen", 273.0, ATM, 3.211 / ATM, "organic vapours", WELTY),
    ("benzene", "oxygen", 296.0, ATM, 0.951 / ATM, "organic vapours", WELTY),
    ("water", "air", 298.0, ATM, 2.634 / ATM, "polar vapours", WELTY),
    ("water", "carbon dioxide", 298.0, ATM, 1.661 / ATM, "polar vapours", WELTY),
    ("water", "oxygen", 308.1, ATM, 2.857 / ATM, "polar vapours", WELTY),
    ("ammonia", "nitrogen", 293.0, ATM, 2.441 / ATM, "polar vapours", WELTY),
    ("ammonia", "oxygen", 293.0, ATM, 2.563 / ATM, "polar vapours", WELTY),
    ("sulfur dioxide", "air", 273.0, ATM, 1.236 / ATM, "polar vapours", WELTY),
    ("carbon dioxide", "nitrogen", 298.0, ATM, 1.672 / ATM, "permanent gases", WELTY),
    ("oxygen", "hydrogen", 273.0, ATM, 7.061 / ATM, "permanent gases", WELTY),
    ("ethane", "hydrogen", 273.0, ATM, 4.447 / ATM, "permanent gases", WELTY),
    ("methane", "hydrogen", 273.0, ATM, 6.331 / ATM, "permanent gases", WELTY),
    ("propane", "carbon dioxide", 298.0, ATM, 0.874 / ATM, "permanent gases", WELTY),
    ("ethylene", "nitrogen", 298.0, ATM, 1.651 / ATM, "permanent gases", WELTY),
    # --- hydrocarbon pairs ---
    ("nitrogen", "ethane", 298.2, ATM, 0.148e-4, "hydrocarbon pairs", BSL),
    ("nitrogen", "n-butane", 298.2, ATM, 0.0960e-4, "hydrocarbon pairs", BSL),
    ("propane", "n-butane", 378.2, ATM, 0.0768e-4, "hydrocarbon pairs", BSL),
    ("propane", "n-butane", 437.7, ATM, 0.107e-4, "hydrocarbon pairs", BSL),
    ("propane", "isobutane", 298.0, ATM, 0.0439e-4, "hydrocarbon pairs", BSL),
    ("propane", "isobutane", 378.2, ATM, 0.0823e-4, "hydrocarbon pairs", BSL),
    ("propane", "isobutane", 437.8, ATM, 0.112e-4, "hydrocarbon pairs", BSL),
    ("propane", "neopentane", 298.1, ATM, 0.0431e-4, "hydrocarbon pairs", BSL),
    ("propane", "neopentane", 378.2, ATM, 0.0703e-4, "hydrocarbon pairs", BSL),
    ("propane", "neopentane", 437.7, ATM, 0.0945e-4, "hydrocarbon pairs", BSL),
    ("n-butane", "neopentane", 298.0, ATM, 0.0413e-4, "hydrocarbon pairs", BSL),
    ("n-butane", "neopentane", 378.2, ATM, 0.0644e-4, "hydrocarbon pairs", BSL),
    ("n-butane", "neopentane", 437.8, ATM, 0.0839e-4, "hydrocarbon pairs", BSL),
    ("isobutane", "neopentane", 298.1, ATM, 0.0362e-4, "hydrocarbon pairs", BSL),
    ("isobutane", "neopentane", 378.2, ATM, 0.0580e-4, "hydrocarbon pairs", BSL),
    ("isobutane", "neopentane", 437.7, ATM, 0.0786e-4, "hydrocarbon pairs", BSL),
    # --- Welty et al. Table J.1: pairs not read from another table above ---
    ("carbon dioxide", "air", 273.0, ATM, 0.136e-4, "permanent gases", WELTY_J),
    ("carbon dioxide", "methane", 273.0, ATM, 0.153e-4, "permanent gases", WELTY_J),
    ("carbon dioxide", "nitrous oxide", 298.0, ATM, 0.117e-4, "permanent gases", WELTY_J),
    ("carbon monoxide", "ethylene", 273.0, ATM, 0.151e-4, "permanent gases", WELTY_J),
    ("carbon monoxide", "hydrogen", 273.0, ATM, 0.651e-4, "permanent gases", WELTY_J),
    ("carbon monoxide", "nitrogen", 288.0, ATM, 0.192e-4, "permanent gases", WELTY_J),
    ("carbon monoxide", "oxygen", 273.0, ATM, 0.185e-4, "permanent gases", WELTY_J),
    ("argon", "neon", 293.0, ATM, 0.329e-4, "permanent gases", WELTY_J),
    ("helium", "argon", 273.0, ATM, 0.641e-4, "permanent gases", WELTY_J),
    ("helium", "neon", 293.0, ATM, 1.23e-4, "permanent gases", WELTY_J),
    ("helium", "hydrogen", 293.0, ATM, 1.64e-4, "permanent gases", WELTY_J),
    ("hydrogen", "argon", 293.0, ATM, 0.770e-4, "permanent gases", WELTY_J),
    ("nitrogen", "hydrogen", 288.0, ATM, 0.743e-4, "permanent gases", WELTY_J),
    ("oxygen", "ethylene", 293.0, ATM, 0.182e-4, "permanent gases", WELTY_J),
    ("water", "helium", 298.0, ATM, 0.908e-4, "polar vapours", WELTY_J),
    ("water", "hydrogen", 293.0, ATM, 0.850e-4, "polar vapours", WELTY_J),
    ("ammonia", "hydrogen", 293.0, ATM, 0.849e-4, "polar vapours", WELTY_J),
    ("ammonia", "ethylene", 293.0, ATM, 0.177e-4, "polar vapours", WELTY_J),
    ("chlorine", "air", 273.0, ATM, 0.124e-4, "polar vapours", WELTY_J),
    ("bromine", "air", 293.0, ATM, 0.091e-4, "polar vapours", WELTY_J),
    ("aniline", "air", 298.0, ATM, 0.0726e-4, "organic vapours", WELTY_J),
    ("benzene", "helium", 298.0, ATM, 0.384e-4, "organic vapours", WELTY_J),
    ("ethanol", "helium", 298.0, ATM, 0.494e-4, "organic vapours", WELTY_J),
    ("methanol", "carbon dioxide", 298.6, ATM, 0.105e-4, "organic vapours", WELTY_J),
    ("diethyl ether", "carbon dioxide", 273.0, ATM, 0.0541e-4, "organic vapours", WELTY_J),
]

#: Cussler, Diffusion: Mass Transfer in Fluid Systems, 3rd ed., Table 5.2-1 (dilute in water).
CUSSLER = "Cussler 3rd ed. Table 5.2-1 (from memory)"
#: Benitez, Principles and Modern Applications of Mass Transfer Operations, Appendix Table A.2
#: (infinite dilution), read from a reproduction of the appendix (scribd.com document 379518623).
BENITEZ = "Benitez, Appendix Table A.2"
#: Geankoplis, Transport Processes and Separation Process Principles, 4th ed., Table 6.3-1.
GEANKOPLIS = "Geankoplis 4th ed. Table 6.3-1, dilute (from memory)"
#: Benitez Table A.2, water as solvent, read from the same reproduction: the two rows below agree
#: with Cussler 3rd ed. Table 5.2-1 (from memory), which the file cited for them before.
BENITEZ_WATER = "Benitez, Appendix Table A.2 (water; also Cussler Table 5.2-1, from memory)"
#: Winkelmann, Diffusion in Gases, Liquids and Electrolytes, Landolt-Boernstein New Series IV/15B2
#: (Springer 2018), one chapter per pair, read from the chapter pages; each row names the
#: measurement the chapter lists (the lowest solute concentration given).
LB = "Winkelmann, Landolt-Boernstein IV/15B2 (2018)"
#: Su, Duncan, Momaya, Jutila & Needham, J. Chem. Phys. 132, 044506 (2010), abstract: water in
#: n-alcohols by single-microdroplet dissolution.  The abstract gives no temperature; the
#: measurements were made at room temperature, entered here as 298.15 K (from memory).
SU = "Su et al., J. Chem. Phys. 132, 044506 (2010), abstract; T 298 K (from memory)"
#: D'Errico, Ortona, Capuano & Vitagliano, "Diffusion Coefficients for the Binary System
#: Glycerol + Water at 25 C. A Velocity Correlation Study", J. Chem. Eng. Data 49, 1665 (2004),
#: doi 10.1021/je049917u: the mutual diffusion coefficient at the glycerol end, 1.4e-11 m^2/s (two
#: figures), read as quoted with that reference in the public research repository
#: soeeol/SPIV-PLIF, file analysis/a_diffusivity_solubility.m (the paper's own table was not
#: read).  The property layer gives glycerol 1013 mPa s at 298.15 K, against about 940 mPa s
#: measured (from memory): some 7 % of each method's deviation on this row comes from there.
DERRICO = "D'Errico et al., J. Chem. Eng. Data 49, 1665 (2004), via soeeol/SPIV-PLIF"
#: Nogami & Kato, Yakugaku Zasshi 82, 120 (1962): oxygen in 1,2-propanediol + water at 22.5 C by
#: polarography, read as transcribed in the public research repository soeeol/SPIV-PLIF, file
#: fluidprop/fluidprop.m (volume fraction 1.0: 40e-11 m^2/s).  As transcribed, the value at
#: volume fraction 1.0 is above the one at 0.89 (34e-11), though the viscosity rises, and that
#: repository applies a solubility correction to such polarographic values: the row is less
#: certain than its two figures suggest.
NOGAMI = "Nogami & Kato, Yakugaku Zasshi 82, 120 (1962), via soeeol/SPIV-PLIF"

LIQUID_SYSTEMS: list[tuple[str, str, float, float, str, str]] = [
    # --- organic solutes in water ---
    (
        "ethylbenzene",
        "water",
        293.0,
        0.81e-9,
        "organic solutes in water",
        "Poling et al. 5th ed. ch. 11 example (from memory)",
    ),
    ("benzene", "water", 298.15, 1.02e-9, "organic solutes in water", CUSSLER),
    ("acetone", "water", 298.15, 1.16e-9, "organic solutes in water", CUSSLER),
    ("acetic acid", "water", 298.15, 1.21e-9, "organic solutes in water", CUSSLER),
    ("ethanol", "water", 298.15, 1.24e-9, "organic solutes in water", GEANKOPLIS),
    ("methanol", "water", 288.15, 1.28e-9, "organic solutes in water", GEANKOPLIS),
    ("1-butanol", "water", 288.15, 0.77e-9, "organic solutes in water", GEANKOPLIS),
    ("urea", "water", 298.15, 1.38e-9, "organic solutes in water", GEANKOPLIS),
    ("ethylene glycol", "water", 298.15, 1.16e-9, "organic solutes in water", CUSSLER),
    ("glycerol", "water", 298.15, 1.06e-9, "organic solutes in water", CUSSLER),
    ("aniline", "water", 293.15, 0.92e-9, "organic solutes in water", CUSSLER),
    # --- dissolved gases in water ---
    ("oxygen", "water", 298.15, 2.10e-9, "gases in water", CUSSLER),
    ("carbon dioxide", "water", 298.0, 1.92e-9, "gases in water", BENITEZ_WATER),
    ("nitrogen", "water", 298.15, 1.88e-9, "gases in water", CUSSLER),
    ("methane", "water", 298.0, 1.49e-9, "gases in water", BENITEZ_WATER),
    ("ethane", "water", 298.15, 1.20e-9, "gases in water", CUSSLER),
    ("propane", "water", 298.15, 0.97e-9, "gases in water", CUSSLER),
    ("ammonia", "water", 298.15, 1.64e-9, "gases in water", CUSSLER),
    ("hydrogen", "water", 298.15, 4.50e-9, "gases in water", CUSSLER),
    ("chlorine", "water", 298.0, 1.25e-9, "gases in water", BENITEZ),
    # --- solutes in organic solvents ---
    # acetic acid and benzoic acid in benzene: the same values in Geankoplis (from memory)
    ("acetic acid", "benzene", 298.0, 2.09e-9, "solutes in organic solvents", BENITEZ),
    ("benzoic acid", "benzene", 298.0, 1.38e-9, "solutes in organic solvents", BENITEZ),
    ("aniline", "benzene", 298.0, 1.96e-9, "solutes in organic solvents", BENITEZ),
    ("bromobenzene", "benzene", 281.0, 1.45e-9, "solutes in organic solvents", BENITEZ),
    ("ethanol", "benzene", 288.15, 2.25e-9, "solutes in organic solvents", GEANKOPLIS),
    ("acetic acid", "acetone", 298.15, 3.31e-9, "solutes in organic solvents", GEANKOPLIS),
    ("water", "ethanol", 298.15, 1.132e-9, "solutes in organic solvents", GEANKOPLIS),
    ("chloroform", "ethanol", 293.15, 1.25e-9, "solutes in organic solvents", GEANKOPLIS),
    (
        "benzene",
        "ethanol",
        298.15,
        1.81e-9,
        "solutes in organic solvents",
        "Lusis & Ratcliff, AIChE J. 17, 1492 (1971) (from memory)",
    ),
    (
        "toluene",
        "n-hexane",
        298.15,
        4.21e-9,
        "solutes in organic solvents",
        "Poling et al. 5th ed. Table 11-5 (from memory)",
    ),
    (
        "benzene",
        "n-heptane",
        298.15,
        3.40e-9,
        "solutes in organic solvents",
        "Poling et al. 5th ed. Table 11-5 (from memory)",
    ),
    (
        "benzene",
        "n-dodecane",
        298.15,
        1.550e-9,
        "solutes in organic solvents",
        f"{LB}: Albright & Aoyagi, J. Chem. Phys. 64, 81 (1976), x = 0.0229",
    ),
    (
        "biphenyl",
        "benzene",
        298.15,
        1.554e-9,
        "solutes in organic solvents",
        f"{LB}: Mills, J. Phys. Chem. 67, 600 (1963), tracer at 0.00013 mol/L",
    ),
    (
        "n-hexane",
        "benzene",
        295.35,
        2.13e-9,
        "solutes in organic solvents",
        f"{LB}: Varoqui, Daune & Freund, J. Chim. Phys. 58, 394 (1961), x = 0.0045",
    ),
    # chloroform and ethyl acetate as solvents (Benitez Table A.2, read as above)
    ("acetone", "chloroform", 298.0, 2.35e-9, "solutes in organic solvents", BENITEZ),
    ("benzene", "chloroform", 288.0, 2.51e-9, "solutes in organic solvents", BENITEZ),
    ("ethanol", "chloroform", 288.0, 2.20e-9, "solutes in organic solvents", BENITEZ),
    ("diethyl ether", "chloroform", 298.0, 2.13e-9, "solutes in organic solvents", BENITEZ),
    ("ethyl acetate", "chloroform", 298.0, 2.02e-9, "solutes in organic solvents", BENITEZ),
    ("methyl ethyl ketone", "chloroform", 298.0, 2.13e-9, "solutes in organic solvents", BENITEZ),
    ("acetic acid", "ethyl acetate", 293.0, 2.18e-9, "solutes in organic solvents", BENITEZ),
    ("acetone", "ethyl acetate", 293.0, 3.18e-9, "solutes in organic solvents", BENITEZ),
    ("ethyl benzoate", "ethyl acetate", 293.0, 1.85e-9, "solutes in organic solvents", BENITEZ),
    ("methyl ethyl ketone", "ethyl acetate", 303.0, 2.93e-9, "solutes in organic solvents", BENITEZ),
    ("nitrobenzene", "ethyl acetate", 293.0, 2.25e-9, "solutes in organic solvents", BENITEZ),
    ("water", "ethyl acetate", 298.0, 3.20e-9, "solutes in organic solvents", BENITEZ),
    # --- solutes in viscous solvents (here above 2.5 mPa s at the row's temperature) ---
    ("water", "1-octanol", 298.15, 0.364e-9, "viscous solvents", SU),
    # beyond the correlations' 20 mPa s: every method warns (and is far low) on these two
    ("oxygen", "propylene glycol", 295.65, 4.0e-10, "viscous solvents", NOGAMI),
    ("water", "glycerol", 298.15, 1.4e-11, "viscous solvents", DERRICO),
]
