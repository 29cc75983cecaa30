"""Hypothesis strategies for downstream property-based tests, and invariant checks.

``hypothesis`` is an optional dependency: importing this module without it
raises :class:`~masstransfer.errors.MissingDependencyError` saying what to
install.  A downstream test::

    from hypothesis import given
    import masstransfer as mt
    from masstransfer import testing as mts

    @given(mts.gas_states())
    def test_my_dryer_model_is_symmetric(state):
        mts.check_gas_symmetry(state)
        assert my_model(state.solute, state.carrier, state.T, state.P) > 0

Every state drawn is one for which the default method is valid: species
the databases resolve, temperatures and pressures inside the method's range,
solvents liquid at the drawn temperature.
"""

from __future__ import annotations

import functools
import math
from dataclasses import dataclass
from typing import TYPE_CHECKING, Any, Final

import numpy as np

from ..errors import MissingDependencyError

try:
    from hypothesis import assume
    from hypothesis import strategies as st
    from hypothesis.extra import numpy as hnp
except ImportError as exc:  # pragma: no cover - exercised by a test that hides hypothesis
    raise MissingDependencyError(
        "masstransfer.testing needs hypothesis; install it with "
        "`pip install hypothesis` (or `pip install masstransfer[test]`)"
    ) from exc

if TYPE_CHECKING:
    from ..surface._record import Correlation

__all__ = [
    "GAS_CARRIERS",
    "GAS_SOLUTES",
    "LIQUID_SOLUTES",
    "SOLVENTS",
    "GasState",
    "LiquidState",
    "check_analogy_round_trip",
    "check_gas_pressure_scaling",
    "check_gas_symmetry",
    "check_nusselt_equals_sherwood",
    "correlation_inputs",
    "gas_states",
    "liquid_states",
]

#: Solutes the default gas method (Fuller) covers and the databases resolve.
GAS_SOLUTES: Final = (
    "water",
    "methanol",
    "ethanol",
    "acetone",
    "benzene",
    "toluene",
    "ammonia",
    "carbon dioxide",
    "oxygen",
    "nitrogen",
    "hydrogen",
    "helium",
    "n-hexane",
    "chloroform",
    "ethyl acetate",
)
#: Carrier gases with property models in the property layer.
GAS_CARRIERS: Final = ("air", "nitrogen", "helium", "carbon dioxide", "oxygen", "argon")
#: Liquid solutes with boiling-point volumes.
LIQUID_SOLUTES: Final = (
    "oxygen",
    "carbon dioxide",
    "nitrogen",
    "methane",
    "benzene",
    "toluene",
    "ethanol",
    "acetone",
    "acetic acid",
    "ethylbenzene",
)
#: Solvents with liquid property models.
SOLVENTS: Final = ("water", "ethanol", "methanol", "benzene", "n-hexane", "toluene")

_T_GAS: Final = (250.0, 1000.0)  # K, inside every carrier's property range
_P_GAS: Final = (1.0e3, 1.0e6)  # Pa, the low-pressure range of the gas methods


@dataclass(frozen=True)
class GasState:
    """A dilute solute in a carrier gas at a state (T [K], P [Pa]; floats or equal-shape arrays)."""

    solute: str
    carrier: str
    T: Any
    P: Any


@dataclass(frozen=True)
class LiquidState:
    """A dilute solute in a solvent at T [K] (float or array), the solvent liquid there."""

    solute: str
    solvent: str
    T: Any


def _floats(lo: float, hi: float, log: bool = False) -> st.SearchStrategy[float]:
    if not log:
        return st.floats(min_value=lo, max_value=hi, allow_nan=False, allow_infinity=False)
    return st.floats(min_value=math.log(lo), max_value=math.log(hi)).map(
        lambda u: min(max(math.exp(u), lo), hi)
    )


def _maybe_array(
    draw: Any, value: st.SearchStrategy[float], arrays: bool, shape: tuple[int, ...] | None
) -> Any:
    if not arrays:
        return draw(value)
    return draw(hnp.arrays(np.float64, shape or (1,), elements=value))


@st.composite
def _gas_state(draw: Any, arrays: bool, max_size: int) -> GasState:
    solute = draw(st.sampled_from(GAS_SOLUTES))
    carrier = draw(st.sampled_from([c for c in GAS_CARRIERS if c != solute]))
    shape = (draw(st.integers(1, max_size)),) if arrays else None
    T = _maybe_array(draw, _floats(*_T_GAS), arrays, shape)
    P = _maybe_array(draw, _floats(*_P_GAS, log=True), arrays, shape)
    return GasState(solute, carrier, T, P)


def gas_states(*, arrays: bool = False, max_size: int = 20) -> st.SearchStrategy[GasState]:
    """Draw (solute, carrier, T, P) states valid for the default gas method.

    Parameters
    ----------
    arrays : bool
        Draw T and P as float64 arrays of one shape instead of floats.
    max_size : int
        Largest array length when ``arrays`` is true [-].

    Returns
    -------
    hypothesis.strategies.SearchStrategy
        Strategy of :class:`GasState`; T in 250-1000 K, P in 1 kPa-1 MPa.

    References
    ----------
    MacIver, D. R. et al. (2019). Hypothesis: A new approach to
    property-based testing. *JOSS* 4(43), 1891. https://doi.org/10.21105/joss.01891

    Examples
    --------
    >>> from hypothesis import given
    >>> @given(gas_states())
    ... def test_positive(state):
    ...     from masstransfer import gas_diffusivity
    ...     assert gas_diffusivity(state.solute, state.carrier, state.T, state.P) > 0
    >>> test_positive()

    """
    _warm_gas()
    return _gas_state(arrays, max_size)


@functools.lru_cache(maxsize=1)
def _warm_gas() -> None:
    """Read every drawn species' constants and carrier models before any draw.

    Species constants are read on first use; doing it here keeps one-off database loads out
    of the user's test bodies (and out of any deadline they set).
    """
    from ..substances._properties import gas_model
    from ..substances._species import species

    for name in dict.fromkeys((*GAS_SOLUTES, *GAS_CARRIERS)):
        _ = species(name).sources  # completes the record
    for carrier in GAS_CARRIERS:
        gas_model(carrier)


def _liquid_ranges() -> dict[str, tuple[float, float]]:
    """Liquid temperature range of each solvent, resolved before any draw."""
    from ..substances._properties import liquid_model
    from ..substances._species import species

    for solute in LIQUID_SOLUTES:  # every constant read now, not inside the user's test body
        _ = species(solute).sources
    ranges = {}
    for solvent in SOLVENTS:
        model, sp = liquid_model(solvent), species(solvent)
        lo = max(model.T_min, (sp.Tm or 0.0) + 2.0, 273.2)
        hi = min(model.T_max, (sp.Tb or math.inf) - 2.0, 370.0)
        ranges[solvent] = (lo, hi)
    return ranges


@st.composite
def _liquid_state(
    draw: Any, arrays: bool, max_size: int, ranges: dict[str, tuple[float, float]]
) -> LiquidState:
    solvent = draw(st.sampled_from(SOLVENTS))
    solute = draw(st.sampled_from([s for s in LIQUID_SOLUTES if s != solvent]))
    lo, hi = ranges[solvent]
    shape = (draw(st.integers(1, max_size)),) if arrays else None
    T = _maybe_array(draw, _floats(lo, hi), arrays, shape)
    return LiquidState(solute, solvent, T)


def liquid_states(*, arrays: bool = False, max_size: int = 20) -> st.SearchStrategy[LiquidState]:
    """Draw (solute, solvent, T) with the solvent liquid at T (below its normal boiling point).

    Parameters
    ----------
    arrays : bool
        Draw T as a float64 array instead of a float.
    max_size : int
        Largest array length when ``arrays`` is true [-].

    Returns
    -------
    hypothesis.strategies.SearchStrategy
        Strategy of :class:`LiquidState`; T between the melting point (or
        0 C) and 2 K below the normal boiling point (at most 370 K).

    References
    ----------
    MacIver, D. R. et al. (2019). *JOSS* 4(43), 1891.

    Examples
    --------
    >>> from hypothesis import given, settings
    >>> @settings(max_examples=5)
    ... @given(liquid_states())
    ... def test_liquid(state):
    ...     from masstransfer import liquid_diffusivity
    ...     assert liquid_diffusivity(state.solute, state.solvent, state.T) > 0
    >>> test_liquid()

    """
    return _liquid_state(arrays, max_size, _liquid_ranges())


def correlation_inputs(
    record: str | Correlation, *, transport: str = "heat", arrays: bool = False, max_size: int = 20
) -> st.SearchStrategy[dict[str, Any]]:
    """Draw keyword inputs inside a correlation's envelope.

    Parameters
    ----------
    record : str or Correlation
        The record or its slug.
    transport : {'heat', 'mass'}
        Name the Prandtl-type input ``Pr`` (heat) or ``Sc`` (mass).
    arrays : bool
        Draw the first input as an array.
    max_size : int
        Largest array length [-].

    Returns
    -------
    hypothesis.strategies.SearchStrategy
        Strategy of dicts ready for ``record.nusselt(**d)`` or
        ``record.sherwood(**d)``; values log-uniform inside the envelope
        (capped at 1e9), required parameters drawn inside their envelope or
        domain.

    References
    ----------
    MacIver, D. R. et al. (2019). *JOSS* 4(43), 1891.

    Examples
    --------
    >>> from hypothesis import given, settings
    >>> from masstransfer import surface
    >>> rec = surface.correlation("sphere-ranz-marshall")
    >>> @settings(max_examples=10)
    ... @given(correlation_inputs(rec, transport="mass"))
    ... def test_inside(inputs):
    ...     assert rec.sherwood(strict=True, **inputs) >= 2.0
    >>> test_inside()

    """
    from ..surface import _lookup as catalogue

    rec = catalogue.correlation(record) if isinstance(record, str) else record
    mass = transport == "mass"

    def bounds(key: str) -> tuple[float, float]:
        lo, hi = rec.envelope.get(key, rec.domain.get(key, (0.0, math.inf)))
        dlo, dhi = rec.domain.get(key, (0.0, math.inf))
        lo, hi = max(lo, dlo, 1e-3), min(hi, dhi, 1e9)
        return lo, max(hi, lo)

    @st.composite
    def draw_inputs(draw: Any) -> dict[str, Any]:
        out: dict[str, Any] = {}
        shape = (draw(st.integers(1, max_size)),) if arrays else None
        for i, key in enumerate(rec.inputs):
            lo, hi = bounds(key)
            name = "Sc" if (mass and key == "Pr") else key
            out[name] = _maybe_array(draw, _floats(lo, hi, log=True), arrays and i == 0, shape)
        for key, default in rec.parameters.items():
            if default is None:
                lo, hi = bounds(key)
                out[key] = draw(_floats(lo, min(hi, 1e6), log=lo > 0))
        # conditions on products of inputs and branch envelopes (e.g. Re Pr >= 100)
        assume(not rec.outside("mass" if mass else "heat", **out))
        return out

    return draw_inputs()


# --- invariant checks ------------------------------------------------------------------------


def check_analogy_round_trip(h: Any, rho: Any, cp: Any, Pr: Any, Sc: Any, rtol: float = 1e-12) -> None:
    """Assert that h -> k_c -> h returns h.

    Parameters
    ----------
    h : float or array_like
        Heat-transfer coefficient [W/(m^2 K)].
    rho : float or array_like
        Density [kg/m^3].
    cp : float or array_like
        Heat capacity [J/(kg K)].
    Pr : float or array_like
        Prandtl number [-].
    Sc : float or array_like
        Schmidt number [-].
    rtol : float
        Relative tolerance [-].

    Returns
    -------
    None
        Raises AssertionError when the invariant fails.

    References
    ----------
    Chilton, T. H., & Colburn, A. P. (1934). *Ind. Eng. Chem.* 26, 1183-1187.

    Examples
    --------
    >>> check_analogy_round_trip(30.0, 1.2, 1007.0, 0.71, 0.6)

    """
    from .._validation import collect_warnings
    from ..surface._analogy import heat_transfer_coefficient_from_mass, mass_transfer_coefficient_from_heat

    with collect_warnings():  # the round trip holds outside the analogy's stated range too
        k = mass_transfer_coefficient_from_heat(h, rho=rho, cp=cp, Pr=Pr, Sc=Sc)
        back = heat_transfer_coefficient_from_mass(k, rho=rho, cp=cp, Pr=Pr, Sc=Sc)
    np.testing.assert_allclose(back, h, rtol=rtol, err_msg="h -> k_c -> h did not return h")


def check_gas_symmetry(state: GasState, method: str = "fuller") -> None:
    """Assert that D_AB = D_BA for the drawn state.

    Parameters
    ----------
    state : GasState
        A state from :func:`gas_states`.
    method : str
        Gas method to check.

    Returns
    -------
    None
        Raises AssertionError when the invariant fails.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Section 11-1.

    Examples
    --------
    >>> check_gas_symmetry(GasState("water", "air", 300.0, 101325.0))

    """
    from ..diffusivity._gas import GAS_METHODS, gas_diffusivity
    from ..substances._species import species

    ab = gas_diffusivity(state.solute, state.carrier, state.T, state.P, method)
    # the roles swapped through the method's own record: the medium's phase check (the carrier
    # must be a vapour, the solute need not be) does not apply to the swapped pair
    rec = GAS_METHODS[method]
    ba = rec.evaluate(rec.prepare(species(state.carrier), species(state.solute)), state.T, state.P)
    np.testing.assert_allclose(ab, ba, rtol=1e-12, err_msg="D_AB differs from D_BA")


def check_gas_pressure_scaling(state: GasState, factor: float = 2.0, method: str = "fuller") -> None:
    """Assert that the low-pressure gas diffusivity scales as 1/P.

    Parameters
    ----------
    state : GasState
        A state from :func:`gas_states`.
    factor : float
        Pressure ratio to test [-] (the scaled pressure stays below 1 MPa
        when factor <= 1).
    method : str
        Gas method to check.

    Returns
    -------
    None
        Raises AssertionError when the invariant fails.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Section 11-3.

    Examples
    --------
    >>> check_gas_pressure_scaling(GasState("water", "air", 300.0, 101325.0), factor=0.5)

    """
    from ..diffusivity._gas import gas_diffusivity

    d1 = np.asarray(gas_diffusivity(state.solute, state.carrier, state.T, state.P, method))
    d2 = np.asarray(
        gas_diffusivity(state.solute, state.carrier, state.T, np.asarray(state.P) * factor, method)
    )
    np.testing.assert_allclose(d1, d2 * factor, rtol=1e-12, err_msg="D*P is not constant")


def check_nusselt_equals_sherwood(record: str | Correlation, inputs: dict[str, Any]) -> None:
    """Assert that a record gives Nu = Sh when Pr = Sc.

    Parameters
    ----------
    record : str or Correlation
        The record or its slug.
    inputs : dict
        Heat-form inputs, e.g. from ``correlation_inputs(record)``.

    Returns
    -------
    None
        Raises AssertionError when the invariant fails.

    References
    ----------
    Incropera, F. P., DeWitt, D. P. et al. (2007). *Fundamentals of Heat and
    Mass Transfer*, 6th ed., Section 6.7.1 (the heat-mass analogy).

    Examples
    --------
    >>> check_nusselt_equals_sherwood("sphere-ranz-marshall", {"Re": 50.0, "Pr": 0.7})

    """
    from ..surface import _lookup as catalogue

    rec = catalogue.correlation(record) if isinstance(record, str) else record
    mass = {("Sc" if k == "Pr" else k): v for k, v in inputs.items()}
    np.testing.assert_array_equal(rec.nusselt(**inputs), rec.sherwood(**mass), err_msg="Nu != Sh at Pr = Sc")
