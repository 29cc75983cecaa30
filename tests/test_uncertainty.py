"""Relative standard uncertainty through the names-in chain, checked by a vectorised Monte Carlo.

The linearised value (sensitivity exponents) must agree with the spread of the same chain
evaluated on sampled inputs within 10 % of the uncertainty.
"""

from __future__ import annotations

import json
import math
import warnings

import numpy as np
import pytest

import masstransfer as mt
from masstransfer import surface
from masstransfer._uncertainty import combine, stated_uncertainty

_N = 400_000  # samples: the standard error of a sampled standard deviation is 1/sqrt(2N), 0.1 %


def _rng():
    return np.random.default_rng(20240614)


# -- the conversions of a stated accuracy ------------------------------------------------------


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        # average absolute deviation, normal errors: sigma = AAD * sqrt(pi/2) (Geary 1935, from memory)
        ("about 4-5 %", 0.05 * math.sqrt(math.pi / 2)),  # upper end of a stated range
        ("Wilke & Chang (1955): about 10-15 %", 0.15 * math.sqrt(math.pi / 2)),
        ("about 10 %", 0.10 * math.sqrt(math.pi / 2)),
        # a bound: uniform half-width / sqrt(3) (JCGM 100:2008, 4.3.7, from memory)
        ("within 10 %", 0.10 / math.sqrt(3)),
        ("Stokes-Einstein: large spherical solutes and particles only", None),
    ],
    ids=["range", "wilke-chang", "single", "bound", "no-number"],
)
def test_stated_accuracy_to_standard_uncertainty(text, expected):
    got = stated_uncertainty(text)
    assert got == (None if expected is None else pytest.approx(expected, rel=1e-12))


def test_record_with_a_number_is_read_as_an_average_absolute_deviation():
    class Record:
        accuracy_pct = 8.0

    assert stated_uncertainty(Record()) == pytest.approx(0.08 * math.sqrt(math.pi / 2), rel=1e-12)


def test_the_aad_conversion_by_sampling():
    # normal errors with the derived sigma reproduce the stated average absolute deviation
    sigma = stated_uncertainty("about 4-5 %")
    z = _rng().standard_normal(_N) * sigma
    assert np.mean(np.abs(z)) == pytest.approx(0.05, rel=0.01)


def test_the_bound_conversion_by_sampling():
    sigma = stated_uncertainty("within 10 %")
    z = _rng().uniform(-0.10, 0.10, _N)
    assert np.std(z) == pytest.approx(sigma, rel=0.01)


def test_combine_by_hand():
    # sqrt(0.10^2 + (2/3 * 0.06)^2) = sqrt(0.01 + 0.0016) = 0.107703 (by hand)
    assert combine((1.0, 0.10), (2.0 / 3.0, 0.06)) == pytest.approx(0.1077033, rel=1e-6)
    assert combine((1.0, None), (2.0, None)) is None


# -- reports and coefficients carry it ---------------------------------------------------------


def test_diffusivity_report_carries_the_method_uncertainty():
    r = mt.diffusivity_report("toluene", "air", 350.0)
    assert r.relative_uncertainty == pytest.approx(0.05 * math.sqrt(math.pi / 2), rel=1e-12)
    assert "±6.3 %" in r.summary()
    liquid = mt.diffusivity_report("toluene", "water", 300.0, phase="liquid", method="stokes-einstein")
    # the record states 20 % for large spheres (an average absolute deviation, as the others)
    assert liquid.relative_uncertainty == pytest.approx(0.20 * math.sqrt(math.pi / 2), rel=1e-12)
    assert mt.units.quantities(liquid)["value"].magnitude == pytest.approx(liquid.value)


def test_coefficients_combine_h_and_diffusivity():
    r = mt.mass_transfer_from_heat(35.0, "water", "air", 320.0, h_uncertainty=0.10)
    u_D = 0.05 * math.sqrt(math.pi / 2)  # Fuller, 5 % average absolute deviation
    assert r.relative_uncertainty == pytest.approx(math.hypot(0.10, 2.0 / 3.0 * u_D), rel=1e-12)
    alone = mt.mass_transfer_from_heat(35.0, "water", "air", 320.0)
    assert alone.relative_uncertainty == pytest.approx(2.0 / 3.0 * u_D, rel=1e-12)


def test_array_h_uncertainty_broadcasts():
    r = mt.mass_transfer_from_heat(35.0, "water", "air", np.array([300.0, 320.0]), h_uncertainty=[0.05, 0.2])
    assert np.shape(r.relative_uncertainty) == (2,)
    assert r.relative_uncertainty[1] > r.relative_uncertainty[0]


def test_negative_h_uncertainty_is_refused():
    with pytest.raises(mt.errors.InputValueError, match="h_uncertainty"):
        mt.mass_transfer_from_heat(35.0, "water", "air", 320.0, h_uncertainty=-0.1)


# -- Monte Carlo agreement ----------------------------------------------------------------------


def _monte_carlo_kc(r, u_h, u_D, exponent=2.0 / 3.0):
    """Sample h and D (normal, independent), rebuild Sc and k_c through the numbers-in chain."""
    rng = _rng()
    h = r.h * (1.0 + u_h * rng.standard_normal(_N))
    D = r.D * (1.0 + u_D * rng.standard_normal(_N))
    Sc = surface.schmidt(D, r.mu / r.rho)
    with warnings.catch_warnings():
        # the perturbed samples' tails leave the analogy's stated Sc range (0.6-3000) on purpose
        warnings.simplefilter("ignore", mt.errors.EnvelopeWarning)
        k_c = surface.mass_transfer_coefficient_from_heat(
            np.abs(h), rho=r.rho, cp=r.cp, Pr=r.Pr, Sc=Sc, exponent=exponent
        )
    return float(np.std(k_c) / np.mean(k_c))


@pytest.mark.parametrize(
    ("solute", "carrier", "T", "phase", "method", "u_h"),
    [
        ("water", "air", 320.0, "gas", None, 0.10),
        ("toluene", "air", 300.0, "gas", "chapman-enskog", 0.05),
        ("ethanol", "air", 330.0, "gas", None, 0.0),
        ("toluene", "water", 300.0, "liquid", None, 0.10),
    ],
    ids=["water-air-h10", "toluene-air-ce", "ethanol-air-D-only", "toluene-water-liquid"],
)
def test_linearised_uncertainty_agrees_with_monte_carlo(solute, carrier, T, phase, method, u_h):
    r = mt.mass_transfer_from_heat(
        30.0, solute, carrier, T, phase=phase, diffusivity_method=method, h_uncertainty=u_h
    )
    report = mt.diffusivity_report(solute, carrier, T, phase=phase, method=method)
    mc = _monte_carlo_kc(r, u_h, report.relative_uncertainty)
    assert abs(mc - r.relative_uncertainty) <= 0.10 * r.relative_uncertainty, (mc, r.relative_uncertainty)


# -- the command line prints ± one standard deviation -------------------------------------------


def test_cli_prints_plus_minus(capsys):
    from masstransfer.cli import main

    assert main(["diffusivity", "toluene", "air", "-T", "350"]) == 0
    D = mt.gas_diffusivity("toluene", "air", 350.0)
    u = 0.05 * math.sqrt(math.pi / 2)
    # the spread to two significant figures, the value to the same decimal place
    assert f"{D:.3e} ± {D * u:.2g}" in capsys.readouterr().out
    assert (
        main(["coefficient", "water", "air", "--h", "35", "-T", "320", "--uncertainty", "0.1", "--json"]) == 0
    )
    data = json.loads(capsys.readouterr().out)
    assert data["relative_uncertainty"] == pytest.approx(math.hypot(0.1, 2.0 / 3.0 * u), rel=1e-12)
    assert main(["coefficient", "water", "air", "--h", "35", "-T", "320", "--uncertainty", "0.1"]) == 0
    assert " ± " in capsys.readouterr().out


def test_users_own_diffusivity_has_the_users_uncertainty_or_none():
    own = mt.mass_transfer_from_heat(35.0, "water", "air", 320.0, D=2.5e-5)
    assert own.relative_uncertainty is None  # nothing stated, nothing invented
    both = mt.mass_transfer_from_heat(
        35.0, "water", "air", 320.0, D=2.5e-5, h_uncertainty=0.1, D_uncertainty=0.1
    )
    assert both.relative_uncertainty == pytest.approx(math.hypot(0.1, 2.0 / 3.0 * 0.1), rel=1e-12)
    liquid = mt.mass_transfer_from_heat(900.0, "oxygen", "water", 300.0, phase="liquid", D=2.1e-9)
    assert liquid.relative_uncertainty is None


def test_mixture_carrier_takes_the_binary_methods_uncertainty():
    r = mt.mass_transfer_from_heat(35.0, "water", {"nitrogen": 0.79, "oxygen": 0.21}, 320.0)
    u_D = 0.05 * math.sqrt(math.pi / 2)  # Fuller binaries; Blanc's law adds none of its own
    assert r.relative_uncertainty == pytest.approx(2.0 / 3.0 * u_D, rel=1e-12)


def test_cli_says_how_the_spread_follows_from_the_stated_accuracy(capsys):
    from masstransfer.cli import main

    assert main(["diffusivity", "toluene", "air", "-T", "300"]) == 0
    out = capsys.readouterr().out
    # Fuller's stated 5 % average absolute deviation times sqrt(pi/2) = 6.27 %
    assert "± one standard deviation, 6.3 %: the stated average absolute deviation, 5 %" in out
