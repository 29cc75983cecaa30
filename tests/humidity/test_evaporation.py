"""One-call evaporation: a textbook constant-rate example, the by-hand chain, heat balance, errors."""

from __future__ import annotations

import numpy as np
import pytest

import masstransfer as mt
from masstransfer import humidity, surface
from masstransfer.surface._flux import high_flux_rate


def test_constant_rate_drying_textbook_example():
    # Geankoplis, Transport Processes and Separation Process Principles, 4th ed., Example 9.6-1
    # (from memory): air at 65.6 C with humidity 0.010 kg/kg flows parallel to a wet tray;
    # h = 62.45 W/(m^2 K) from the book's correlation; wet bulb 28.9 C from the chart;
    # constant drying rate R_c = 3.39 kg/(h m^2).  Our surface temperature comes from the
    # analogy rather than the chart (psychrometric ratio Le^(2/3) instead of 1), hence the
    # looser tolerance on it.
    r = humidity.evaporation_rate("water", "air", T=273.15 + 65.6, h=62.45, humidity_ratio=0.010)
    assert r.mass_flux_per_hour == pytest.approx(3.39, rel=0.03)
    assert r.T_surface - 273.15 == pytest.approx(28.9, abs=1.5)


def test_one_call_is_consistent_with_the_chain_it_replaces():
    # a consistency check, not a validation: the one call must equal the eight-step chain written
    # out with the library's own pieces (the outside checks are the CoolProp and textbook tests)
    T, rh, P, h = 333.15, 0.05, 101325.0, 28.0
    y = rh * mt.liquid_model("water").vapor_pressure(T) / P
    Ts = mt.wet_surface_temperature("water", "air", T, y, P)
    coeff = mt.mass_transfer_from_heat(h, "water", "air", 0.5 * (T + Ts), P)
    ys = mt.liquid_model("water").vapor_pressure(Ts) / P
    N = high_flux_rate(coeff.k_y, ys, y)
    r = humidity.evaporation_rate("water", "air", T=T, h=h, P=P, relative_humidity=rh)
    assert r.T_surface == pytest.approx(Ts, abs=1e-6)
    assert r.k_c == pytest.approx(coeff.k_c, rel=1e-6)
    assert r.molar_flux == pytest.approx(N, rel=1e-6)
    assert r.mass_flux == pytest.approx(N * 0.01801528, rel=1e-4)
    assert r.mass_flux_per_hour == pytest.approx(3600.0 * r.mass_flux)
    assert r.k_G == pytest.approx(surface.kG_from_kc(r.k_c, r.T_film))


def test_heat_split_closes_and_extra_heat_speeds_drying():
    base = humidity.evaporation_rate("water", "air", T=338.15, h=25.0, humidity_ratio=0.01)
    hot = humidity.evaporation_rate(
        "water",
        "air",
        T=338.15,
        h=25.0,
        humidity_ratio=0.01,
        radiant_temperature=400.0,
        conduction_coefficient=15.0,
    )
    for r in (base, hot):
        supplied = r.q_convective + r.q_radiant + r.q_conducted
        assert supplied == pytest.approx(r.q_latent, rel=1e-6)
    assert base.q_radiant == 0.0
    assert base.q_conducted == 0.0
    assert hot.q_radiant > 0
    assert hot.q_conducted > 0
    assert hot.T_surface > base.T_surface
    assert hot.mass_flux > base.mass_flux


def test_radiation_can_lift_the_surface_above_the_gas():
    r = humidity.evaporation_rate(
        "water", "air", T=300.0, h=5.0, relative_humidity=0.9, radiant_temperature=700.0
    )
    assert r.T_surface > 300.0
    assert r.q_convective < 0  # the gas now cools the surface


def test_saturated_gas_without_extra_heat_does_not_evaporate():
    r = humidity.evaporation_rate("water", "air", T=310.0, h=20.0, relative_humidity=1.0)
    assert r.T_surface == pytest.approx(310.0, abs=1e-9)
    assert abs(r.mass_flux) < 1e-12


def test_arrays_match_scalars_and_mixtures_match_pure():
    T = np.array([320.0, 350.0, 380.0])
    arr = humidity.evaporation_rate("ethanol", "nitrogen", T=T, h=[15.0, 25.0, 35.0], y=0.0)
    for i in range(3):
        one = humidity.evaporation_rate("ethanol", "nitrogen", T=T[i], h=[15.0, 25.0, 35.0][i], y=0.0)
        assert arr.mass_flux[i] == pytest.approx(one.mass_flux, rel=1e-9)
    mix = humidity.evaporation_rate("ethanol", {"nitrogen": 1.0}, T=350.0, h=25.0, y=0.0)
    assert mix.mass_flux == pytest.approx(arr.mass_flux[1], rel=1e-12)
    assert mix.gas == "nitrogen"


def test_composition_of_air_gives_the_air_answer():
    # the library's air is N2/O2/Ar by the same mixing rules; Fuller's air volume versus Blanc's
    # law over the components moves D by about 3 %, the rate by about 2 %
    comp = {"nitrogen": 0.7808, "oxygen": 0.2095, "argon": 0.0097}
    a = humidity.evaporation_rate("water", "air", T=330.0, h=30.0, relative_humidity=0.1)
    b = humidity.evaporation_rate("water", comp, T=330.0, h=30.0, relative_humidity=0.1)
    assert b.mass_flux == pytest.approx(a.mass_flux, rel=0.03)
    assert "Blanc" in b.method


def test_correlation_path_uses_the_record():
    rec = surface.correlation("flat-plate-laminar-average")
    r = humidity.evaporation_rate(
        "water",
        "air",
        T=340.0,
        relative_humidity=0.1,
        correlation="flat-plate-laminar-average",
        velocity=3.0,
        L=0.5,
    )
    air = mt.gas_model("air")
    Tf = r.T_film
    Re = air.density(Tf) * 3.0 * 0.5 / air.viscosity(Tf)
    assert r.h == pytest.approx(
        rec.nusselt(Re=Re, Pr=air.prandtl(Tf)) * air.thermal_conductivity(Tf) / 0.5, rel=1e-6
    )
    assert r.k_c == pytest.approx(rec.sherwood(Re=Re, Sc=r.Sc) * r.D / 0.5, rel=1e-6)
    assert r.correlation == "flat-plate-laminar-average"


def test_user_properties_let_an_unknown_liquid_evaporate():
    # a hand-built species the databases do not know, with every property it needs supplied
    # (values invented for this test, roughly those of a light alcohol)
    sp = mt.Species(name="solvent X", molar_mass=0.06)
    r = humidity.evaporation_rate(
        sp,
        "nitrogen",
        T=330.0,
        h=20.0,
        y=0.0,
        vapour_pressure=lambda T: 1e5 * np.exp(10.0 * (1.0 - 355.0 / T)),
        latent_heat=7.0e5,
        cp_vapour=1500.0,
        D=1.0e-5,
    )
    assert set(r.user_supplied) == {"vapour_pressure", "latent_heat", "cp_vapour", "D"}
    assert 250.0 < r.T_surface < 330.0
    assert r.mass_flux > 0
    assert pytest.approx(1.0e-5) == r.D


def test_clear_errors():
    with pytest.raises(mt.errors.InputTypeError, match="exactly one humidity"):
        humidity.evaporation_rate("water", "air", T=330.0, h=20.0)
    with pytest.raises(mt.errors.InputTypeError, match="h="):
        humidity.evaporation_rate("water", "air", T=330.0, y=0.01)
    with pytest.raises(mt.errors.InputTypeError, match="not both"):
        humidity.evaporation_rate("water", "air", T=330.0, h=5.0, y=0.01, correlation="sphere-ranz-marshall")
    with pytest.raises(mt.errors.InputValueError, match="emissivity"):
        humidity.evaporation_rate("water", "air", T=330.0, h=5.0, y=0.01, emissivity=1.5)
    with pytest.raises(mt.errors.OutOfRangeError, match="boiling"):
        humidity.evaporation_rate("water", "air", T=330.0, h=5.0, y=0.01, radiant_temperature=5000.0)
    with pytest.raises(mt.errors.UnknownSpeciesError):
        humidity.evaporation_rate("no such liquid at all", "air", T=330.0, h=5.0, y=0.0)


def test_mass_transfer_from_heat_takes_compositions_and_overrides():
    # CoolProp HAPropsSI: viscosity ("mu") and conductivity ("k") of humid air by mole fraction
    CP = pytest.importorskip("CoolProp.CoolProp")
    r = mt.mass_transfer_from_heat(30.0, "ethanol", {"air": 0.97, "water": 0.03}, 320.0)
    assert r.mu == pytest.approx(CP.HAPropsSI("mu", "T", 320.0, "P", 101325.0, "Y", 0.03), rel=0.03)
    assert r.k == pytest.approx(CP.HAPropsSI("k", "T", 320.0, "P", 101325.0, "Y", 0.03), rel=0.03)
    assert r.carrier.startswith("mixture(")
    # Blanc's law over the binaries (Poling et al., 5th ed., Eq. 11-7.2)
    comp = {"nitrogen": 0.79, "oxygen": 0.21}
    m = mt.mass_transfer_from_heat(30.0, "water", comp, 320.0)
    D_n2 = mt.gas_diffusivity("water", "nitrogen", 320.0)
    D_o2 = mt.gas_diffusivity("water", "oxygen", 320.0)
    assert pytest.approx(1.0 / (0.79 / D_n2 + 0.21 / D_o2), rel=1e-9) == m.D
    own = mt.mass_transfer_from_heat(30.0, "water", "air", 320.0, D=2.6e-5, mu=1.9e-5)
    assert own.D == 2.6e-5
    assert own.mu == 1.9e-5
    assert own.user_supplied == ("mu", "D")
    assert mt.mass_transfer_from_heat(30.0, "water", "air", 320.0).user_supplied == ()
    with pytest.raises(mt.errors.InputValueError, match="gas carrier only"):
        mt.mass_transfer_from_heat(30.0, "water", comp, 320.0, phase="liquid")
    with pytest.raises(mt.errors.InputValueError, match="add up"):
        mt.mass_transfer_from_heat(30.0, "water", {"nitrogen": 0.5, "oxygen": 0.2}, 320.0)


def test_wet_surface_temperature_takes_overrides():
    lq = mt.liquid_model("ethanol")
    own = mt.wet_surface_temperature(
        "ethanol", "air", 300.0, 0.0, vapour_pressure=lq.psat, latent_heat=lq.enthalpy_vaporization
    )
    assert own == pytest.approx(mt.wet_surface_temperature("ethanol", "air", 300.0, 0.0), abs=1e-9)
    # a larger latent heat takes more heat per kilogram: the balance settles at a colder surface,
    # where convection brings more heat and the vapour pressure drives less evaporation
    colder = mt.wet_surface_temperature(
        "ethanol", "air", 300.0, 0.0, latent_heat=1.2 * lq.enthalpy_vaporization(280.0)
    )
    assert colder < own


def test_below_the_property_models_the_message_names_the_limit_and_the_fix():
    from masstransfer.surface._wet_surface import _below_models

    # ethyl acetate melts at 189 K (CRC Handbook, from memory): a model limit at 289 K is not freezing
    sp = mt.species("ethyl acetate")
    text = _below_models(sp, 289.0, "surface temperature")
    assert "freeze" not in text
    assert "vapour_pressure=" in text
    assert "melts at 189" in text
    # at the melting point itself the liquid does freeze
    assert "freezes" in _below_models(sp, sp.Tm, "surface temperature")
