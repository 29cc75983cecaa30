"""The library's constants agree with scipy.constants (CODATA, exact SI values) to the last digit."""

from __future__ import annotations

import re

import pytest
from scipy import constants as sc

from masstransfer import constants as c


@pytest.mark.parametrize(
    ("ours", "reference"),
    [
        (c.R_GAS, sc.R),
        (c.BOLTZMANN, sc.k),
        (c.AVOGADRO, sc.N_A),
        (c.SPEED_OF_LIGHT, sc.c),
        (c.ATM, sc.atm),
        (c.T_ICE, sc.zero_Celsius),
        (c.GRAVITY, sc.g),
        (c.DEBYE, 1e-21 / sc.c),  # the debye is defined as 1e-21/c C m (IUPAC Green Book, 3rd ed.)
    ],
    ids=["R", "k_B", "N_A", "c", "atm", "T_ice", "g", "debye"],
)
def test_constant_matches_scipy(ours, reference):
    assert ours == reference


def test_no_other_module_defines_these_constants():
    import pathlib

    import masstransfer

    root = pathlib.Path(masstransfer.__file__).parent
    for path in root.rglob("*.py"):
        if path.name == "constants.py":
            continue
        text = path.read_text(encoding="utf-8")
        for literal in ("8.314", "1.380649", "6.02214", "9.80665", "3.33564"):
            pattern = r"^\s*[A-Za-z_][\w]*\s*(:[^=]*)?=\s*" + re.escape(literal)
            assert not re.search(pattern, text, flags=re.M), f"{path.name} defines {literal} itself"
