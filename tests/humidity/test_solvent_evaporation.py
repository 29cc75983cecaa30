"""Volatile solvents evaporating into dry nitrogen at 25 C: the surface cools below the gas.

Their surfaces settle well below the temperatures where thermo's preferred vapour-pressure
fits start (ethyl acetate 289 K, methyl isobutyl ketone 295 K, diethyl ether 270 K), so these
calls need curves carried on towards the melting point.
"""

from __future__ import annotations

import pytest

import masstransfer as mt
from masstransfer import humidity

SOLVENTS = (
    "ethyl acetate",
    "methyl isobutyl ketone",
    "diethyl ether",
    "methyl ethyl ketone",
    "acetone",
    "isopropanol",
    "1-butanol",
    "toluene",
    "n-hexane",
    "dichloromethane",
)


@pytest.mark.parametrize("name", SOLVENTS)
def test_solvent_evaporates_into_dry_nitrogen_below_ambient(name):
    T = 298.15
    r = humidity.evaporation_rate(name, "nitrogen", T=T, h=20.0, P=101325.0, relative_humidity=0.0)
    lm = mt.liquid_model(name)
    Tm = lm.species.Tm
    assert Tm is not None
    # evaporative cooling: the surface lies below the gas and above the melting point
    assert Tm < r.T_surface < T - 1.0
    assert r.mass_flux > 0.0
    # the heat convected in is what the evaporating liquid carries away (no radiation, no tray)
    assert r.q_latent == pytest.approx(r.q_convective, rel=1e-6)
    # the surface is saturated: its vapour mole fraction is the vapour pressure over P
    assert r.y_surface == pytest.approx(lm.vapor_pressure(r.T_surface) / 101325.0, rel=1e-6)


def test_more_volatile_solvents_run_colder():
    # diethyl ether boils at 34.6 C, ethyl acetate at 77.1 C, MIBK at 116.5 C (CRC Handbook, from
    # memory): in the same gas the more volatile liquid evaporates faster and cools further
    r = {
        n: humidity.evaporation_rate(n, "nitrogen", T=298.15, h=20.0, relative_humidity=0.0)
        for n in ("diethyl ether", "ethyl acetate", "methyl isobutyl ketone")
    }
    assert r["diethyl ether"].T_surface < r["ethyl acetate"].T_surface < r["methyl isobutyl ketone"].T_surface
