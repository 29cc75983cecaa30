"""Robustness sweep: every public function, adversarial inputs, only finite results or our own errors.

For each function a set of valid arguments is known; hypothesis replaces one of them with NaN,
infinities, negatives, zero, empty or nested arrays, wrong types, or a large array of valid values.
The call must either return finite numbers or raise ``MassTransferError``; any other exception, or
a numpy RuntimeWarning (a silent NaN in the making), fails the test.
"""

from __future__ import annotations

import dataclasses
import inspect
import os
import warnings
from typing import Any

import numpy as np
import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

import masstransfer as mt
from masstransfer import bodies, contactors, diffusivity, humidity, substances, surface, sweep

_PET = bodies.Layer(12e-6, permeability=1e-17)
_REC = surface.correlation("sphere-ranz-marshall")
_HAUSEN = surface.correlation("duct-entry-hausen")

# (name, function, valid keyword arguments)
CASES: list[tuple[str, Any, dict[str, Any]]] = [
    ("species", mt.species, {"identifier": "toluene"}),
    (
        "fuller",
        diffusivity.fuller,
        {"T": 300.0, "P": 1e5, "M_a": 0.018, "M_b": 0.029, "v_a": 13.1, "v_b": 19.7},
    ),
    (
        "chapman_enskog",
        diffusivity.chapman_enskog,
        {"T": 300.0, "P": 1e5, "M_a": 0.028, "M_b": 0.032, "sigma_ab": 3.6e-10, "epsilon_ab_k": 90.0},
    ),
    (
        "wilke_lee",
        diffusivity.wilke_lee,
        {"T": 300.0, "P": 1e5, "M_a": 0.028, "M_b": 0.032, "sigma_ab": 3.6e-10, "epsilon_ab_k": 90.0},
    ),
    (
        "brokaw",
        diffusivity.brokaw,
        {
            "T": 323.0,
            "P": 1e5,
            "M_a": 0.05,
            "M_b": 0.064,
            "Vb_a": 5e-5,
            "Vb_b": 4.4e-5,
            "Tb_a": 249.0,
            "Tb_b": 263.0,
            "dipole_a": 6e-30,
            "dipole_b": 5e-30,
        },
    ),
    ("blanc", diffusivity.blanc, {"D_binary": [2e-5, 1e-5], "mole_fractions": [0.5, 0.5]}),
    ("neufeld", diffusivity.neufeld_collision_integral, {"T_star": 1.5}),
    (
        "rescale",
        diffusivity.rescale_gas_diffusivity,
        {"D_ref": 2.6e-5, "T_ref": 298.0, "P_ref": 1e5, "T": 350.0},
    ),
    (
        "gas_diffusivity",
        mt.gas_diffusivity,
        {"solute": "water", "medium": "air", "T": 300.0, "P": 1e5},
    ),
    (
        "gas_diffusivity_ce",
        mt.gas_diffusivity,
        {"solute": "carbon dioxide", "medium": "air", "T": 300.0, "method": "chapman-enskog"},
    ),
    (
        "gas_mixture",
        diffusivity.gas_diffusivity_in_mixture,
        {"solute": "water", "carrier": {"nitrogen": 0.8, "oxygen": 0.2}, "T": 300.0},
    ),
    ("fuller_volume", diffusivity.fuller_volume, {"sp": "benzene"}),
    ("report", mt.diffusivity_report, {"solute": "water", "medium": "air", "T": 300.0}),
    (
        "wilke_chang",
        diffusivity.wilke_chang,
        {"T": 298.0, "mu_solvent": 9e-4, "M_solvent": 0.018, "V_solute": 1e-4},
    ),
    ("hm_aqueous", diffusivity.hayduk_minhas_aqueous, {"T": 298.0, "mu_water": 9e-4, "V_solute": 1e-4}),
    ("hm_paraffin", diffusivity.hayduk_minhas_paraffin, {"T": 298.0, "mu_solvent": 3e-4, "V_solute": 1e-4}),
    (
        "hm_general",
        diffusivity.hayduk_minhas,
        {
            "T": 298.0,
            "mu_solvent": 6e-4,
            "V_solvent": 1e-4,
            "parachor_solute": 3e-5,
            "parachor_solvent": 4e-5,
        },
    ),
    (
        "tyn_calus",
        diffusivity.tyn_calus,
        {
            "T": 298.0,
            "mu_solvent": 6e-4,
            "V_solute": 7e-5,
            "V_solvent": 1e-4,
            "parachor_solute": 3e-5,
            "parachor_solvent": 4e-5,
        },
    ),
    ("stokes_einstein", diffusivity.stokes_einstein, {"T": 298.0, "mu_solvent": 9e-4, "radius": 1e-8}),
    (
        "nernst_haskell",
        diffusivity.nernst_haskell,
        {"T": 298.0, "mu_water": 9e-4, "D_cation": 1.3e-9, "D_anion": 2.0e-9, "z_cation": 2.0},
    ),
    (
        "liquid_diffusivity",
        mt.liquid_diffusivity,
        {"solute": "benzene", "solvent": "water", "T": 298.0},
    ),
    ("liquid_inputs", diffusivity.liquid_diffusivity_inputs, {"solute": "water", "solvent": "ethanol"}),
    ("available_methods", diffusivity.available_methods, {"solute": "water", "medium": "air"}),
    ("liquid_default", diffusivity.liquid_default, {"solvent": "ethanol"}),
    ("classify", diffusivity.classify, {"sp": "ethanol"}),
    ("knudsen", diffusivity.knudsen_diffusivity, {"T": 300.0, "pore_diameter": 1e-8, "M": 0.032}),
    ("bosanquet", diffusivity.bosanquet, {"D_molecular": 2e-5, "D_knudsen": 2e-6}),
    ("effective", diffusivity.effective_diffusivity, {"D": 1e-6, "porosity": 0.4, "tortuosity": 3.0}),
    ("arrhenius_D", diffusivity.arrhenius_diffusivity, {"T": 1000.0, "D0": 2e-5, "Ea": 1.5e5}),
    ("arrhenius_fit", diffusivity.arrhenius_parameters, {"T": [900.0, 1000.0], "D": [1e-12, 5e-12]}),
    ("reynolds", surface.reynolds, {"V": 1.0, "L": 0.1, "nu": 1.5e-5}),
    ("prandtl", surface.prandtl, {"cp": 1007.0, "k": 0.026, "mu": 1.8e-5}),
    ("schmidt", surface.schmidt, {"D": 2.6e-5, "nu": 1.6e-5}),
    (
        "grashof_solutal",
        surface.grashof_solutal,
        {"L": 0.1, "rho_surface": 1.15, "rho_bulk": 1.18, "nu": 1.6e-5},
    ),
    ("grashof_thermal", surface.grashof_thermal, {"L": 0.1, "beta": 3e-3, "dT": 10.0, "nu": 1.6e-5}),
    (
        "archimedes",
        surface.archimedes,
        {"d": 2e-3, "rho_fluid": 998.0, "rho_particle": 1.2, "mu": 1e-3},
    ),
    ("biot_mass", surface.biot_mass, {"k_c": 1e-4, "L": 2e-3, "D_solid": 1e-10}),
    ("graetz", surface.graetz, {"Re": 1000.0, "Pr": 5.0, "diameter": 0.01, "x": 1.0}),
    ("record_nusselt", _REC.nusselt, {"Re": 50.0, "Pr": 0.7}),
    ("record_sherwood", _REC.sherwood, {"Re": 50.0, "Sc": 0.7}),
    ("hausen", _HAUSEN.nusselt, {"Re": 500.0, "Pr": 0.7, "L_over_d": 20.0}),
    ("gnielinski", surface.correlation("duct-gnielinski").nusselt, {"Re": 2e4, "Pr": 3.0}),
    ("find", surface.find_correlations, {"geometry": "sphere", "Re": 50.0, "Sc": 1.0}),
    ("get", surface.correlation, {"slug": "duct-gnielinski"}),
    ("friction", surface.darcy_friction_smooth, {"Re": 1e5}),
    (
        "k_from_h",
        surface.mass_transfer_coefficient_from_heat,
        {"h": 30.0, "rho": 1.2, "cp": 1007.0, "Pr": 0.7, "Sc": 0.6},
    ),
    (
        "h_from_k",
        surface.heat_transfer_coefficient_from_mass,
        {"k_c": 0.03, "rho": 1.2, "cp": 1007.0, "Pr": 0.7, "Sc": 0.6},
    ),
    ("sh_from_nu", surface.sherwood_from_nusselt, {"Nu": 100.0, "Pr": 0.7, "Sc": 0.6}),
    ("von_karman", surface.stanton_von_karman, {"f_darcy": 0.02, "Pr": 0.7}),
    ("prandtl_taylor", surface.stanton_prandtl_taylor, {"f_darcy": 0.02, "Pr": 0.7}),
    ("lewis", surface.lewis_relation, {"Pr": 0.7, "Sc": 0.6}),
    ("psychrometric", surface.psychrometric_ratio, {"h": 30.0, "k_Y": 0.03, "c_s": 1020.0}),
    (
        "mass_from_heat",
        mt.mass_transfer_from_heat,
        {"h": 30.0, "solute": "water", "carrier": "air", "T": 320.0},
    ),
    ("log_mean", surface.log_mean, {"a": 2.0, "b": 1.0}),
    ("ky_from_kc", surface.ky_from_kc, {"k_c": 0.02, "T": 300.0, "P": 1e5}),
    ("F_from_k", surface.F_from_k, {"k": 0.5, "y_BM": 0.9}),
    ("overall_gas", surface.overall_gas_coefficient, {"k_y": 1.0, "k_x": 2.0, "m": 40.0}),
    ("fick", surface.fick_flux, {"D": 1e-9, "c1": 10.0, "c2": 2.0, "thickness": 1e-3}),
    ("profile", surface.fick_profile, {"x": 2e-4, "c1": 10.0, "c2": 2.0, "thickness": 1e-3}),
    (
        "stagnant",
        surface.stagnant_film_flux,
        {"D": 1.87e-5, "T": 273.15, "P": 1e5, "p1": 13000.0, "p2": 6500.0, "thickness": 0.002},
    ),
    (
        "equimolar",
        surface.equimolar_flux,
        {"D": 1.87e-5, "T": 273.15, "p1": 13000.0, "p2": 6500.0, "thickness": 0.002},
    ),
    ("high_flux_correction", surface.high_flux_correction, {"phi": 0.5}),
    ("high_flux_rate", surface.high_flux_rate, {"F": 1.0, "y_surface": 0.3, "y_bulk": 0.05}),
    ("ackermann", surface.ackermann_correction, {"N": 0.05, "cp_molar": 34.0, "h": 30.0}),
    ("wet_bulb", mt.wet_bulb_temperature, {"T": 303.15, "relative_humidity": 0.5}),
    (
        "wet_surface",
        mt.wet_surface_temperature,
        {"liquid": "ethanol", "gas": "air", "T": 300.0, "y_bulk": 0.0},
    ),
    ("convert_permeability", bodies.convert_permeability, {"value": 1.0, "from_unit": "barrer"}),
    ("convert_flux", bodies.convert_flux, {"value": 1.0, "from_unit": "g(H2O)/(m2 day)"}),
    ("permeability", bodies.permeability, {"D": 1e-12, "S": 1e-4}),
    ("steady_flux", bodies.steady_flux, {"layers": [_PET], "p_high": 2e4}),
    ("arrhenius_ref", diffusivity.arrhenius_diffusivity, {"T": 310.0, "D0": 1.0, "Ea": -4e4, "T_ref": 298.0}),
    ("time_lag", bodies.time_lag, {"thickness": 5e-5, "D": 1e-12}),
    ("lag_to_D", bodies.diffusivity_from_time_lag, {"thickness": 5e-5, "lag": 400.0}),
    ("permeation_curve", bodies.permeation_curve, {"t": 1000.0, "thickness": 5e-5, "D": 1e-12}),
    ("ingress", bodies.oxygen_ingress, {"area": 0.05, "layers": [_PET], "t": 86400.0}),
    ("uptake", bodies.fractional_uptake, {"shape": "sphere", "t": 100.0, "D": 1e-10, "size": 1e-3}),
    (
        "uptake_biot",
        bodies.fractional_uptake,
        {"shape": "slab", "t": 100.0, "D": 1e-10, "size": 1e-3, "biot": 2.0},
    ),
    (
        "c_profile",
        bodies.concentration_profile,
        {"shape": "cylinder", "position": 5e-4, "t": 1e3, "D": 1e-10, "size": 1e-3},
    ),
    ("semi_inf", bodies.semi_infinite_concentration, {"x": 1e-4, "t": 1e3, "D": 1e-10, "c_surface": 1.0}),
    ("semi_inf_uptake", bodies.semi_infinite_uptake, {"t": 1e3, "D": 1e-10, "c_surface": 1.0, "k": 1e-7}),
    ("half_time", bodies.half_time, {"shape": "slab", "D": 1e-10, "size": 1e-3}),
    ("gas_model", mt.gas_model, {"gas": "nitrogen"}),
    ("liquid_model", mt.liquid_model, {"liquid": "water"}),
    ("henry", substances.henry_constant, {"solute": "oxygen", "solvent": "water", "T": 298.0}),
    ("parachor", substances.parachor, {"liquid": "benzene"}),
    ("quayle_parachor", substances.quayle_parachor, {"atoms": {"C": 6, "H": 6}, "smiles": "c1ccccc1"}),
    ("air_viscosity", mt.gas_model("air").viscosity, {"T": 300.0}),
    ("quantities", mt.units.quantities, {"result": mt.diffusivity_report("water", "air", 300.0)}),
    ("water_density", mt.liquid_model("water").density, {"T": 300.0}),
    ("water_surface_tension", mt.liquid_model("water").surface_tension, {"T": 300.0}),
    # contactors
    ("packing", contactors.packing, {"name": "pall-ring-metal-50"}),
    (
        "onda_wetted_area",
        contactors.onda_wetted_area,
        {"a": 112.6, "sigma_c": 0.075, "sigma": 0.072, "L_mass": 5.0, "mu_L": 1e-3, "rho_L": 998.0},
    ),
    (
        "onda_k_L",
        contactors.onda_k_L,
        {
            "L_mass": 5.0,
            "a_w": 60.0,
            "mu_L": 1e-3,
            "rho_L": 998.0,
            "D_L": 1.9e-9,
            "a": 112.6,
            "nominal_size": 0.05,
        },
    ),
    (
        "onda_k_G",
        contactors.onda_k_G,
        {
            "G_mass": 1.8,
            "a": 112.6,
            "mu_G": 1.8e-5,
            "rho_G": 1.2,
            "D_G": 1.6e-5,
            "nominal_size": 0.05,
            "T": 298.0,
        },
    ),
    (
        "bs_k_L",
        contactors.billet_schultes_k_L,
        {
            "u_L": 0.005,
            "a": 112.6,
            "void_fraction": 0.951,
            "C_L": 1.192,
            "rho_L": 998.0,
            "mu_L": 1e-3,
            "D_L": 1.9e-9,
        },
    ),
    (
        "bs_holdup",
        contactors.billet_schultes_holdup,
        {"u_L": 0.005, "a": 112.6, "C_h": 0.784, "rho_L": 998.0, "mu_L": 1e-3},
    ),
    (
        "bs_k_G",
        contactors.billet_schultes_k_G,
        {
            "u_V": 1.5,
            "u_L": 0.005,
            "a": 112.6,
            "void_fraction": 0.951,
            "C_V": 0.41,
            "C_h": 0.784,
            "rho_V": 1.2,
            "mu_V": 1.8e-5,
            "D_V": 1.6e-5,
            "rho_L": 998.0,
            "mu_L": 1e-3,
            "T": 298.0,
        },
    ),
    (
        "bs_area",
        contactors.billet_schultes_area,
        {"u_L": 0.005, "a": 112.6, "void_fraction": 0.951, "rho_L": 998.0, "mu_L": 1e-3, "sigma": 0.072},
    ),
    (
        "bs_loading",
        contactors.billet_schultes_loading_velocity,
        {
            "u_L": 0.005,
            "u_V": 2.0,
            "a": 112.6,
            "void_fraction": 0.951,
            "C_S": 2.725,
            "rho_L": 998.0,
            "rho_V": 1.2,
            "mu_L": 1e-3,
            "mu_V": 1.8e-5,
        },
    ),
    (
        "brf_k_L",
        contactors.bravo_rocha_fair_k_L,
        {
            "u_L": 0.003,
            "void_fraction": 0.9,
            "S": 0.0089,
            "B": 0.0127,
            "h": 0.0064,
            "theta": 60.0,
            "rho_L": 998.0,
            "mu_L": 1e-3,
            "D_L": 1.9e-9,
        },
    ),
    (
        "brf_k_G",
        contactors.bravo_rocha_fair_k_G,
        {
            "u_V": 1.5,
            "u_L": 0.003,
            "void_fraction": 0.9,
            "S": 0.0089,
            "B": 0.0127,
            "h": 0.0064,
            "theta": 60.0,
            "rho_V": 1.2,
            "mu_V": 1.8e-5,
            "D_V": 1.6e-5,
            "rho_L": 998.0,
            "mu_L": 1e-3,
            "T": 298.0,
        },
    ),
    (
        "packed_column",
        contactors.packed_column,
        {
            "packing": "pall-ring-metal-50",
            "u_V": 1.2,
            "u_L": 0.005,
            "T": 298.0,
            "rho_V": 1.2,
            "mu_V": 1.8e-5,
            "D_V": 1.6e-5,
            "rho_L": 998.0,
            "mu_L": 1e-3,
            "D_L": 1.9e-9,
            "sigma": 0.072,
        },
    ),
    (
        "rate_packing",
        contactors.rate_packing,
        {
            "solute": "ammonia",
            "gas": "air",
            "liquid": "water",
            "packing": "pall-ring-metal-50",
            "T": 298.0,
            "u_V": 1.2,
            "u_L": 0.005,
            "method": "onda",
        },
    ),
    (
        "rate_bubble_column",
        contactors.rate_bubble_column,
        {"solute": "oxygen", "liquid": "water", "T": 298.0, "u_G": 0.05, "diameter": 0.3},
    ),
    (
        "ay_holdup",
        contactors.akita_yoshida_holdup,
        {"u_G": 0.05, "diameter": 0.3, "rho_L": 998.0, "mu_L": 1e-3, "sigma": 0.072},
    ),
    (
        "ay_kla",
        contactors.akita_yoshida_kla,
        {"u_G": 0.05, "diameter": 0.3, "rho_L": 998.0, "mu_L": 1e-3, "sigma": 0.072, "D_L": 2e-9},
    ),
    ("vant_riet", contactors.vant_riet_kla, {"power_per_volume": 1000.0, "u_G": 0.01}),
    (
        "calderbank_k_L",
        contactors.calderbank_bubble_k_L,
        {"bubble_diameter": 0.004, "D_L": 2e-9, "rho_L": 998.0, "mu_L": 1e-3, "rho_G": 1.2},
    ),
    (
        "sano_k_L",
        contactors.sano_particle_k_L,
        {"epsilon": 0.5, "particle_diameter": 2e-4, "nu_L": 1e-6, "D_L": 1e-9},
    ),
    ("hatta", contactors.hatta_number, {"k2": 10.0, "c_B": 500.0, "D_A": 1.8e-9, "k_L": 1e-4}),
    ("enhancement", contactors.enhancement_factor, {"hatta": 5.0, "E_inf": 10.0}),
    ("enhancement_film", contactors.enhancement_film, {"hatta": 2.0}),
    ("enhancement_penetration", contactors.enhancement_penetration, {"hatta": 2.0}),
    ("enhancement_renewal", contactors.enhancement_surface_renewal, {"hatta": 2.0}),
    (
        "enhancement_inf",
        contactors.enhancement_instantaneous,
        {"D_A": 1.8e-9, "D_B": 1.2e-9, "c_B": 500.0, "c_Ai": 30.0},
    ),
    (
        "absorption_enhancement",
        contactors.absorption_enhancement,
        {"k2": 5.0, "c_B": 1000.0, "D_A": 1.8e-9, "D_B": 1.2e-9, "k_L": 1e-4, "c_Ai": 3.0},
    ),
    (
        "transfer_units",
        contactors.transfer_units,
        {"y_in": 0.02, "y_out": 0.001, "x_in": 0.0, "m": 1.2, "A": 1.5},
    ),
    (
        "stripping_units",
        contactors.stripping_transfer_units,
        {"x_in": 0.01, "x_out": 0.0005, "y_in": 0.0, "m": 30.0, "S": 2.0},
    ),
    ("htu", contactors.transfer_unit_height, {"flow": 20.0, "Ka": 40.0}),
    ("htu_og", contactors.overall_gas_htu, {"H_G": 0.4, "H_L": 0.3, "A": 1.5}),
    ("htu_ol", contactors.overall_liquid_htu, {"H_G": 0.4, "H_L": 0.3, "A": 1.5}),
    (
        "numerical_ntu",
        contactors.numerical_transfer_units,
        {"y_in": 0.02, "y_out": 0.001, "x_in": 0.0, "L_over_G": 1.8, "equilibrium": 1.2},
    ),
    (
        "film_ntu",
        contactors.film_transfer_units,
        {
            "y_in": 0.02,
            "y_out": 0.001,
            "x_in": 0.0,
            "L_over_G": 1.8,
            "equilibrium": 1.2,
            "kxa_over_kya": 40.0,
        },
    ),
    (
        "column_profile",
        contactors.column_profile,
        {"y_in": 0.02, "x_in": 0.0, "G": 20.0, "L": 36.0, "Kya": 40.0, "equilibrium": 1.2, "y_out": 0.001},
    ),
    (
        "column_rating",
        contactors.column_profile,
        {"y_in": 0.02, "x_in": 0.0, "G": 20.0, "L": 36.0, "Kya": 40.0, "equilibrium": 1.2, "height": 3.0},
    ),
    # humidity: psychrometrics, evaporation, drying, towers
    (
        "humid_gas_state",
        humidity.humid_gas_state,
        {"liquid": "water", "gas": "air", "T": 303.15, "relative_humidity": 0.5},
    ),
    (
        "humid_gas_state_dew",
        humidity.humid_gas_state,
        {"liquid": "toluene", "gas": "nitrogen", "T": 330.0, "dew_point": 290.0},
    ),
    ("Y_from_y", humidity.humidity_ratio_from_y, {"y": 0.02, "M_vapour": 0.018, "M_gas": 0.029}),
    ("y_from_Y", humidity.y_from_humidity_ratio, {"humidity_ratio": 0.01, "M_vapour": 0.018, "M_gas": 0.029}),
    (
        "evaporation_rate",
        humidity.evaporation_rate,
        {"liquid": "water", "gas": "air", "T": 333.15, "h": 28.0, "humidity_ratio": 0.005},
    ),
    (
        "evaporation_radiant",
        humidity.evaporation_rate,
        {
            "liquid": "ethanol",
            "gas": "nitrogen",
            "T": 320.0,
            "h": 20.0,
            "y": 0.01,
            "radiant_temperature": 340.0,
            "conduction_coefficient": 5.0,
        },
    ),
    (
        "evaporation_correlation",
        humidity.evaporation_rate,
        {
            "liquid": "water",
            "gas": "air",
            "T": 340.0,
            "relative_humidity": 0.1,
            "correlation": "flat-plate-laminar-average",
            "velocity": 3.0,
            "L": 0.5,
        },
    ),
    (
        "drying_time",
        humidity.drying_time,
        {
            "mass_flux": 1e-4,
            "shape": "slab",
            "size": 0.01,
            "dry_density": 1400.0,
            "D": 1e-9,
            "X_initial": 0.4,
            "X_critical": 0.2,
            "X_final": 0.05,
        },
    ),
    (
        "drying_time_biot",
        humidity.drying_time,
        {
            "mass_flux": 1e-4,
            "shape": "sphere",
            "size": 0.005,
            "dry_density": 900.0,
            "D": 1e-9,
            "X_initial": 0.5,
            "X_critical": 0.3,
            "X_final": 0.1,
            "X_equilibrium": 0.02,
            "biot": 2.0,
        },
    ),
    (
        "merkel_ntu",
        humidity.merkel_ntu,
        {
            "T_liquid_in": 313.15,
            "T_liquid_out": 298.15,
            "L_over_G": 0.8,
            "T_gas": 298.15,
            "relative_humidity": 0.4,
        },
    ),
    (
        "counterflow_tower",
        humidity.counterflow_tower,
        {
            "T_liquid_in": 313.15,
            "T_liquid_out": 298.15,
            "L_over_G": 0.8,
            "T_gas": 298.15,
            "relative_humidity": 0.4,
            "steps": 4,
        },
    ),
    (
        "evaporation_flux",
        sweep.evaporation_flux,
        {"h": 20.0, "solute": "water", "medium": "air", "T": 320.0, "P": 101325.0, "y_bulk": 0.01},
    ),
    ("design_grid", sweep.design_grid, {"T": [300.0, 320.0], "h": [10.0, 20.0], "block_states": 2}),
    ("evaluate", sweep.evaluate, {"fn": np.sqrt, "grid": {"x": np.array([1.0, 4.0])}}),
]

# Bad values, grouped by the error each must give for a numeric argument.
_NON_FINITE = [float("nan"), float("inf"), -float("inf"), 1e308, np.array([[1.0, np.nan]])]
_SIGN_OR_ZERO = [-1.0, 0.0, -0.0, -1e-300]  # valid for some arguments, an InputValueError for others
_NOT_NUMBERS = [
    "abc",
    "",
    None,
    True,
    1 + 2j,
    [1.0, "x"],
    ["300"],
    object(),
    {"a": 1},
    np.array(["a", "b"]),
    np.array([True, False]),
    np.array([1 + 1j]),
]
_OTHER = [np.array([]), np.array([1, 2], dtype=np.int64)]  # a result, or an InputValueError
_BAD = [*_NON_FINITE, *_SIGN_OR_ZERO, *_NOT_NUMBERS, *_OTHER]


def _finite(value: Any) -> bool:
    if value is None or isinstance(value, str | bool):
        return True
    if dataclasses.is_dataclass(value) and not isinstance(value, type):
        return all(_finite(getattr(value, f.name)) for f in dataclasses.fields(value))
    if isinstance(value, dict | list | tuple):
        return all(_finite(v) for v in (value.values() if isinstance(value, dict) else value))
    if isinstance(value, int | float | np.ndarray | np.generic):
        arr = np.asarray(value)
        return arr.dtype.kind not in "fc" or bool(np.all(np.isfinite(arr)))
    return True  # records, models, species: objects, not numbers


def _outcome(fn: Any, kwargs: dict[str, Any]) -> BaseException | None:
    """Call ``fn``; return the library error it raised, or None after checking the result is finite.

    Any exception outside the library's family propagates and fails the test as itself.
    """
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", mt.MassTransferWarning)  # envelope warnings are allowed
        warnings.simplefilter(
            "error", RuntimeWarning
        )  # a numpy overflow/invalid is a silent NaN in the making
        try:
            out = fn(**kwargs)
        except mt.MassTransferError as exc:
            return exc
    assert _finite(out), f"non-finite result {out!r}"
    return None


def _default(fn: Any, key: str) -> Any:
    try:
        param = inspect.signature(fn).parameters.get(key)
    except (TypeError, ValueError):
        return inspect.Parameter.empty
    return inspect.Parameter.empty if param is None else param.default


def _kind(valid: Any) -> str:
    if isinstance(valid, str):
        return "name"
    if isinstance(valid, list | tuple) and valid and all(type(v) in (int, float) for v in valid):
        return "number"
    if isinstance(valid, bool) or not isinstance(valid, int | float | np.ndarray):
        return "object"
    return "number"


def _expected(kind: str, bad: Any) -> tuple[tuple[type[BaseException], ...], bool]:
    """The error classes a bad value may give for an argument of this kind, and whether success is allowed."""
    value_error = (mt.errors.InputValueError,)
    type_error = (mt.errors.InputTypeError,)
    if kind == "number":
        if any(bad is b for b in _NON_FINITE):
            return value_error, False
        if any(bad is b for b in _NOT_NUMBERS):
            return type_error, False
        return value_error, True  # sign, zero, empty and integer arrays: some arguments accept them
    if kind == "name":
        if isinstance(bad, str):  # an unknown name or method: a lookup/value error of the family
            return (mt.errors.UnknownSpeciesError, mt.errors.InputValueError), False
        return type_error, bad is None  # None means "the default" for optional choices
    # objects (layers, records, species, models): anything else is the wrong type
    return (*type_error, mt.errors.InputValueError), bad is None


@pytest.mark.parametrize(("name", "fn", "valid"), CASES, ids=[c[0] for c in CASES])
def test_valid_call_is_finite(name, fn, valid):
    assert _outcome(fn, valid) is None


@pytest.mark.parametrize(("name", "fn", "valid"), CASES, ids=[c[0] for c in CASES])
@settings(
    max_examples=int(os.environ.get("ROBUSTNESS_EXAMPLES", "25")),
    suppress_health_check=[HealthCheck.function_scoped_fixture, HealthCheck.too_slow],
    deadline=None,
)
@given(data=st.data())
def test_adversarial_inputs(name, fn, valid, data):
    key = data.draw(st.sampled_from(sorted(valid)), label="argument")
    bad = data.draw(st.sampled_from([*range(len(_BAD)), -1]), label="value")
    if bad == -1:  # a large array of the valid value: a result or an error, never a hang or a NaN
        v = valid[key]
        big = np.full(20_000, v) if isinstance(v, int | float) and not isinstance(v, bool) else v
        _outcome(fn, {**valid, key: big})
        return
    value = _BAD[bad]
    allowed, may_succeed = _expected(_kind(valid[key]), value)
    if value is None and _default(fn, key) is None:
        may_succeed = True  # None is this parameter's own default
    err = _outcome(fn, {**valid, key: value})
    if err is None:
        assert may_succeed, f"{name}({key}={value!r}) returned a result; expected {allowed}"
    else:
        assert isinstance(err, allowed), f"{name}({key}={value!r}) raised {type(err).__name__}: {err}"


# --- physically signed results -------------------------------------------------------------
# Functions whose result may take either sign by nature (fluxes driven by a difference, whose
# direction follows the inputs); every other number-valued public function returns a positive
# quantity (a diffusivity, a coefficient, a dimensionless group, a fraction of uptake, ...).
_EITHER_SIGN = {"fick", "high_flux_rate", "equimolar", "stagnant", "profile"}


def _valid_value(fn: Any, kwargs: dict[str, Any]) -> Any:
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", mt.MassTransferWarning)
        return fn(**kwargs)


_POSITIVE = [
    c
    for c in CASES
    if c[0] not in _EITHER_SIGN and isinstance(v := _valid_value(c[1], c[2]), float) and v > 0
]


@pytest.mark.parametrize(("name", "fn", "valid"), _POSITIVE, ids=[c[0] for c in _POSITIVE])
@settings(max_examples=10, deadline=None, suppress_health_check=[HealthCheck.function_scoped_fixture])
@given(data=st.data())
def test_positive_quantities_stay_positive_and_finite(name, fn, valid, data):
    # every positive number input scaled by 0.5-2: a positive, finite result or a library error
    scaled = dict(valid)
    for key, v in valid.items():
        if type(v) is float and v > 0:
            scaled[key] = v * data.draw(st.floats(0.5, 2.0), label=key)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", mt.MassTransferWarning)
        warnings.simplefilter("error", RuntimeWarning)
        try:
            out = fn(**scaled)
        except mt.MassTransferError:
            return
    assert np.isfinite(out)
    assert out > 0, f"{name}({scaled}) = {out!r}: the quantity must be positive"
