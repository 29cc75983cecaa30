"""Physical quantities (pint) at every public function: converted in, wrapped out, checked.

The sweep reuses the robustness CASES (every public function with valid arguments): each
argument with a documented unit is passed as a quantity in a practical non-SI unit of the same
dimension, and the result must equal the plain SI call, wrapped in the Returns unit.
"""

from __future__ import annotations

import dataclasses
import inspect
import json
import os
import subprocess
import sys
import textwrap
import warnings

import numpy as np
import pytest

import masstransfer as mt
from masstransfer import _units, bodies, diffusivity, surface
from masstransfer.errors import InputTypeError, MassTransferError, UnitError

pint = pytest.importorskip("pint")

from test_robustness import CASES  # noqa: E402 - after the skip: shared valid arguments

ureg = pint.UnitRegistry()
Q = ureg.Quantity

# the practical unit a process engineer would type, per dimension (common practice)
_PRACTICAL = {
    "[temperature]": "degC",
    "[mass] / [length] / [time] ** 2": "bar",
    "[length]": "mm",
    "[length] ** 2 / [time]": "cm^2/s",
    "[mass] / [substance]": "g/mol",
    "[length] ** 3 / [substance]": "cm^3/mol",
    "[mass] / [length] / [time]": "cP",
    "[time]": "min",
    "[length] / [time]": "cm/s",
    "[mass] / [length] ** 3": "g/cm^3",
    "[mass] / [temperature] / [time] ** 3": "kW/(m^2 K)",
    "[length] ** 2 / [temperature] / [time] ** 2": "kJ/(kg K)",
    "[substance] / [length] ** 3": "mol/L",
    "[substance] / [length] ** 2 / [time]": "mmol/(m^2 s)",
    "[length] ** 2 * [mass] / [substance] / [time] ** 2": "kJ/mol",
    "": "percent",
}


def _spec(fn):
    return _units._spec(inspect.unwrap(getattr(fn, "__func__", fn)))


def _as_quantity(value, unit_text):
    q = Q(
        np.asarray(value, dtype=float) if isinstance(value, list) else value,
        _units.parse_unit(ureg, unit_text),
    )
    alt = _PRACTICAL.get(str(q.dimensionality))
    return q.to(alt) if alt else q


def _quantified(fn, valid):
    spec = _spec(fn)
    out, n = {}, 0
    for name, value in valid.items():
        unit = spec.params.get(name)
        numeric = isinstance(value, int | float | list) and not isinstance(value, bool)
        if unit is not None and unit.kind == "unit" and numeric:
            out[name] = _as_quantity(value, unit.text)
            if unit.difference and str(out[name].units) == "degree_Celsius":
                out[name] = Q(value, "K").to("delta_degC")
            n += 1
        else:
            out[name] = value
    return out, n


def _same(plain, got, unit):
    if isinstance(plain, float | np.ndarray) and unit.kind == "free" and not hasattr(got, "units"):
        # "[unit of value_ref]" with value_ref a plain number: the unit is unknown, the number plain
        np.testing.assert_allclose(got, plain, rtol=1e-9)
    elif isinstance(plain, float | np.ndarray):
        assert hasattr(got, "units"), f"expected a quantity, got {got!r}"
        want = _units.parse_unit(ureg, unit.text) if unit.kind == "unit" else got.units
        np.testing.assert_allclose(got.to(want).magnitude, plain, rtol=1e-9)
    elif dataclasses.is_dataclass(plain):
        for f in dataclasses.fields(plain):
            a, b = getattr(plain, f.name), getattr(got, f.name)
            if isinstance(a, float | np.ndarray):
                np.testing.assert_allclose(b, a, rtol=1e-9)
    elif isinstance(plain, tuple):
        for a, b in zip(plain, got, strict=True):
            np.testing.assert_allclose(b.magnitude if hasattr(b, "units") else b, a, rtol=1e-9)


_SWEEP = [c for c in CASES if _quantified(c[1], c[2])[1] > 0]


def test_the_sweep_covers_most_public_functions():
    assert len(_SWEEP) >= 60


@pytest.mark.parametrize(("name", "fn", "valid"), _SWEEP, ids=[c[0] for c in _SWEEP])
def test_quantities_in_practical_units_give_the_si_result(name, fn, valid):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", mt.MassTransferWarning)
        plain = fn(**valid)
        got = fn(**_quantified(fn, valid)[0])
    spec = _spec(fn)
    _same(plain, got, spec.returns[0])


@pytest.mark.parametrize(("name", "fn", "valid"), _SWEEP, ids=[c[0] for c in _SWEEP])
def test_a_wrong_dimension_names_argument_given_and_expected_units(name, fn, valid):
    spec = _spec(fn)
    key = next(k for k, v in valid.items() if (u := spec.params.get(k)) is not None and u.kind == "unit")
    wrong = "kg" if str(_units.parse_unit(ureg, spec.params[key].text).dimensionality) != "[mass]" else "s"
    with pytest.raises(UnitError) as info:
        fn(**{**valid, key: Q(1.0, wrong)})
    text = str(info.value)
    assert key in text
    assert wrong in text
    assert spec.params[key].text in text


def test_unit_error_is_in_both_families():
    assert issubclass(UnitError, MassTransferError)
    assert issubclass(UnitError, TypeError)
    assert issubclass(UnitError, InputTypeError)


def test_names_in_with_celsius_and_bar():
    D = mt.gas_diffusivity("water", "air", Q(60.0, "degC"), Q(2.0, "bar"))
    assert D.units == ureg.parse_units("m^2/s")
    assert D.to("m^2/s").magnitude == pytest.approx(
        mt.gas_diffusivity("water", "air", 333.15, 2e5), rel=1e-12
    )


def test_arrays_of_quantities_and_mixed_plain_numbers():
    T = Q(np.array([20.0, 40.0, 60.0]), "degC")
    D = mt.gas_diffusivity("water", "air", T, 101325.0)  # plain numbers keep their SI unit
    np.testing.assert_allclose(
        D.magnitude, mt.gas_diffusivity("water", "air", np.array([293.15, 313.15, 333.15])), rtol=1e-12
    )


def test_fahrenheit_and_psi_convert():
    # 212 degF = 373.15 K and 14.6959 psi = 1 atm (exact definitions, common practice)
    D = mt.gas_diffusivity("water", "air", Q(212.0, "degF"), Q(14.695949, "psi"))
    assert D.magnitude == pytest.approx(mt.gas_diffusivity("water", "air", 373.15, 101325.0), rel=1e-6)


def test_result_in_requested_unit_and_dimensionless_percent():
    Tw = mt.wet_bulb_temperature(Q(30.0, "degC"), Q(50.0, "percent"))
    assert Tw.to("degC").magnitude == pytest.approx(mt.wet_bulb_temperature(303.15, 0.5) - 273.15, rel=1e-12)


def test_plain_call_returns_plain_numbers():
    assert type(mt.gas_diffusivity("water", "air", 300.0)) is float
    assert type(surface.reynolds(1.0, 0.1, 1.5e-5)) is float


def test_free_units_follow_the_first_argument():
    lm = surface.log_mean(Q(1.0, "mol/L"), Q(3000.0, "mol/m^3"))
    assert lm.units == ureg.parse_units("mol/L")
    assert lm.magnitude == pytest.approx(2.0 / np.log(3.0), rel=1e-12)  # (3 - 1)/ln 3, by hand
    with pytest.raises(UnitError, match="b was given in"):
        surface.log_mean(Q(1.0, "mol/L"), Q(3.0, "K"))


def test_method_nominal_unit_is_honoured():
    # Fuller's diffusion volumes are in cm^3/mol by the method's convention: a quantity in m^3/mol
    # is converted to that nominal unit, not to SI
    plain = diffusivity.fuller(300.0, 1e5, 0.018, 0.029, 13.1, 19.7)
    got = diffusivity.fuller(
        Q(300.0, "K"), Q(1.0, "bar"), Q(18.0, "g/mol"), Q(29.0, "g/mol"), Q(13.1e-6, "m^3/mol"), 19.7
    )
    assert got.to("m^2/s").magnitude == pytest.approx(plain, rel=1e-12)


def test_tuple_results_get_one_unit_each():
    D, stderr = bodies.diffusivity_from_time_lag(Q(50.0, "um"), Q(400.0, "s"), Q(20.0, "s"))
    want = bodies.diffusivity_from_time_lag(50e-6, 400.0, 20.0)
    assert D.units == stderr.units == ureg.parse_units("m^2/s")
    assert (D.magnitude, stderr.magnitude) == pytest.approx(want, rel=1e-12)


def test_fit_results_from_quantities_are_si():
    fit = diffusivity.arrhenius_parameters(Q([300.0, 350.0, 400.0], "K"), Q([1e-6, 2e-6, 4e-6], "cm^2/s"))
    Ea = mt.units.quantities(fit)["Ea"]
    assert Ea.to("kJ/mol").magnitude == pytest.approx(fit.Ea / 1e3, rel=1e-12)  # SI inside


def test_property_models_read_their_one_line_docstrings():
    mu = mt.gas_model("air").viscosity(Q(25.0, "degC"))
    assert mu.units == ureg.parse_units("Pa s")
    assert mu.magnitude == pytest.approx(mt.gas_model("air").viscosity(298.15), rel=1e-12)


def test_a_quantity_where_no_unit_belongs_is_refused():
    with pytest.raises(UnitError, match="takes no unit"):
        mt.species(Q(1.0, "m"))
    with pytest.raises(UnitError, match="named by the argument from_unit"):
        bodies.convert_permeability(Q(1.0, "m"), "barrer")


def test_correlation_record_inputs_may_be_dimensionless_quantities():
    rec = surface.correlation("sphere-ranz-marshall")
    got = rec.sherwood(Re=Q(100.0, "dimensionless"), Sc=0.6)
    assert got.magnitude == pytest.approx(rec.sherwood(Re=100.0, Sc=0.6), rel=1e-12)


def test_other_registry_is_used_for_results():
    other = pint.UnitRegistry()
    D = mt.gas_diffusivity("water", "air", other.Quantity(300.0, "K"))
    assert D._REGISTRY is other


def test_result_objects_to_quantities():
    r = mt.mass_transfer_from_heat(Q(35.0, "W/(m^2 K)"), "water", "air", Q(47.0, "degC"))
    q = mt.units.quantities(r, ureg)
    assert q["k_c"].to("mm/s").magnitude == pytest.approx(r.k_c * 1000.0)
    assert q["T"].units == ureg.kelvin
    assert q["solute"] == r.solute
    rep = mt.diffusivity_report("toluene", "air", Q(350.0, "K"))
    assert mt.units.quantities(rep, ureg)["value"].units == ureg.parse_units("m^2/s")


def test_every_guarded_docstring_unit_parses():
    """Every bracketed unit of every public function reads in pint (a typo would fail a user)."""
    from test_docstrings import _FUNCS

    for qualname, fn in _FUNCS:
        spec = _units._spec(inspect.unwrap(fn))
        for name, unit in spec.params.items():
            if unit.kind == "unit":
                assert _units.parse_unit(ureg, unit.text) is not None, (qualname, name)
        for unit in spec.returns:
            if unit.kind == "unit":
                assert _units.parse_unit(ureg, unit.text) is not None, qualname


_NO_PINT = textwrap.dedent(
    """
    import sys

    class _Block:
        def find_spec(self, name, path=None, target=None):
            if name == "pint" or name.startswith("pint."):
                raise ImportError("pint is blocked in this test")
            return None

    sys.meta_path.insert(0, _Block())
    import numpy as np
    import masstransfer as mt
    from masstransfer import surface

    mt.gas_diffusivity("water", "air", 300.0)
    mt.gas_diffusivity("water", "air", np.array([300.0, 310.0]))
    surface.reynolds(1.0, 0.1, 1.5e-5)
    mt.mass_transfer_from_heat(35.0, "water", "air", 320.0, h_uncertainty=0.1)
    mt.wet_bulb_temperature(303.15, 0.5)
    print("pint" in sys.modules, "masstransfer._units" in sys.modules)
    try:
        mt.units.quantities(mt.diffusivity_report("water", "air", 300.0))
    except mt.errors.MissingDependencyError as exc:
        print("missing:", exc)
    from masstransfer.cli import main
    print("cli plain:", main(["diffusivity", "water", "air", "-T", "300", "--json"]) == 0)
    print("cli unit:", main(["diffusivity", "water", "air", "-T", "60 degC"]))
    """
)


def test_without_pint_nothing_is_imported_and_quantities_helper_says_what_to_install():
    env = {**os.environ, "PYTHONWARNINGS": "error"}
    out = subprocess.run(
        [sys.executable, "-c", _NO_PINT], capture_output=True, text=True, env=env, check=True
    )
    lines = out.stdout.splitlines()
    assert lines[0] == "False False"
    assert "pip install 'masstransfer[units]'" in lines[1]
    assert "cli plain: True" in out.stdout
    assert "cli unit: 2" in out.stdout
    assert "values with units need pint: pip install pint" in out.stderr
    assert "pip install 'masstransfer[units]'" in out.stderr  # the extra, as the alternative


# -- the command line ---------------------------------------------------------------------------


def test_cli_reads_values_with_units(capsys):
    from masstransfer.cli import main

    assert main(["diffusivity", "water", "air", "-T", "60 degC", "-P", "2 bar", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert data["T_K"] == [pytest.approx(333.15)]
    assert data["D_m2_per_s"][0] == pytest.approx(mt.gas_diffusivity("water", "air", 333.15, 2e5), rel=1e-12)


def test_cli_plain_numbers_are_si_as_before(capsys):
    from masstransfer.cli import main

    assert main(["wet-bulb", "-T", "303.15", "--rh", "0.5", "--json"]) == 0
    assert json.loads(capsys.readouterr().out)["wet_bulb_K"][0] == pytest.approx(
        mt.wet_bulb_temperature(303.15, 0.5), rel=1e-12
    )
    assert main(["wet-bulb", "-T", "30 degC", "--rh", "50 %", "--json"]) == 0
    assert json.loads(capsys.readouterr().out)["wet_bulb_K"][0] == pytest.approx(
        mt.wet_bulb_temperature(303.15, 0.5), rel=1e-12
    )


def test_cli_wrong_dimension_is_a_usage_error(capsys):
    from masstransfer.cli import main

    assert main(["diffusivity", "water", "air", "-T", "60 bar"]) == 2
    err = capsys.readouterr().err
    assert "-T/--temperature" in err
    assert "bar" in err
    assert "kelvin" in err


def test_cli_output_units_in_table_and_json(capsys):
    from masstransfer.cli import main

    assert main(["coefficient", "water", "air", "--h", "35", "-T", "320", "--units", "k_c=mm/s,T=degC"]) == 0
    table = capsys.readouterr().out
    assert "k_c [mm/s]" in table
    assert "T [degC]" in table
    kc = mt.mass_transfer_from_heat(35.0, "water", "air", 320.0).k_c * 1000.0
    assert f"{kc:.3g} ± " in table  # shown to the place of its two-figure spread (about 1.8 mm/s)
    assert (
        main(["coefficient", "water", "air", "--h", "35", "-T", "320", "--json", "--units", "k_c=mm/s"]) == 0
    )
    data = json.loads(capsys.readouterr().out)
    assert data["converted"]["k_c"]["values"][0] == pytest.approx(kc, rel=1e-12)
    assert data["k_c_m_per_s"][0] == pytest.approx(kc / 1000.0, rel=1e-12)  # SI fields unchanged


def test_cli_unknown_output_column_is_a_library_error(capsys):
    from masstransfer.cli import main

    assert main(["diffusivity", "water", "air", "-T", "300", "--units", "X=K", "--json"]) == 2
    assert json.loads(capsys.readouterr().out)["error"]["type"] == "UnitError"


def test_a_temperature_difference_in_an_offset_unit_is_refused():
    g = {"L": 0.1, "beta": 1.0 / 300.0, "nu": 1.6e-5}
    plain = surface.grashof_thermal(dT=10.0, **g)
    assert surface.grashof_thermal(dT=Q(10.0, "delta_degC"), **g).magnitude == pytest.approx(plain, rel=1e-12)
    with pytest.raises(UnitError, match="dT is a difference"):
        surface.grashof_thermal(dT=Q(10.0, "degC"), **g)


def test_result_fields_named_together_share_units_in_order():
    from masstransfer import humidity

    r = humidity.evaporation_rate("water", "air", 320.0, relative_humidity=0.2, h=30.0)
    q = mt.units.quantities(r, ureg)
    assert q["D"].units == ureg.parse_units("m^2/s")
    assert q["Sc"].units == ureg.dimensionless
    assert q["k_Y"].units == ureg.parse_units("kg/(m^2 s)")
    assert q["mass_flux_per_hour"].to("kg/(m^2 s)").magnitude == pytest.approx(r.mass_flux, rel=1e-9)
