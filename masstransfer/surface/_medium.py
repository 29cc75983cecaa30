"""The medium on the gas side of a surface: a pure gas or a composition, with the user's overrides.

A medium given as a name (``"air"``, ``"nitrogen"``) or a :class:`Species` uses that gas's
property models.  A medium given as a composition (``{"nitrogen": 0.79, "oxygen": 0.21}``,
humid air ``{"air": 0.97, "water": 0.03}``, a flue gas) takes its properties from the mixing
rules of ``chemicals``: Wilke's rule for the viscosity, the Wassiljewa equation with the
Herning-Zipperer factors for the conductivity, the mole-fraction average for the molar heat
capacity and the molar mass (ideal gas).  A dilute solute diffuses through it by Blanc's law.

Any property may be replaced by the user's own value: a number (or array) used as given, or a
callable of temperature [K] (accepting numpy arrays) returning the value in SI units.  The
names of the replaced properties are kept, so results can say which values were the user's.
"""

from __future__ import annotations

import math
import numbers
from collections.abc import Callable, Mapping
from dataclasses import dataclass
from typing import Any, Union

import numpy as np

from .._typing import FloatArray, FloatOrArray
from .._validation import check_positive
from ..constants import R_GAS
from ..errors import InputTypeError, InputValueError, MassTransferError, MissingConstantError
from ..substances._species import Species, species

__all__ = [
    "GasSide",
    "LiquidSide",
    "Override",
    "describe_medium",
    "gas_side",
    "is_composition",
    "liquid_side",
    "property_override",
]

#: A user's property value: a number or array used as given, or a callable of T [K].
Override = Union[float, FloatArray, Callable[[Any], Any], None]  # noqa: UP007 (runtime alias on 3.10)

#: A medium as users give it: a name, a Species, or a composition mapping.
MediumLike = Union[str, Species, Mapping[Any, Any]]  # noqa: UP007


def is_composition(medium: object) -> bool:
    """Tell whether ``medium`` is a composition mapping (rather than one species)."""
    return isinstance(medium, Mapping)


def _composition(medium: Mapping[Any, Any], name: str) -> tuple[tuple[Species, float], ...]:
    if not medium:
        raise InputValueError(
            f"{name}={dict(medium)!r} is an empty composition; pass species and mole fractions, "
            "e.g. {'nitrogen': 0.79, 'oxygen': 0.21}"
        )
    parts: dict[Species, float] = {}
    for key, value in medium.items():
        if not isinstance(key, str | Species):
            raise InputTypeError(
                f"{name} has the key {key!r} ({type(key).__name__}); name each component by a "
                "string or a Species"
            )
        if isinstance(value, bool) or not isinstance(value, numbers.Real):
            raise InputTypeError(
                f"{name}[{key!r}]={value!r} is not a number; pass a mole fraction from 0 to 1"
            )
        y = float(value)
        if not (math.isfinite(y) and 0.0 < y <= 1.0):
            raise InputValueError(
                f"{name}[{key!r}]={y!r} is not a mole fraction above 0 and at most 1; pass one, "
                "or leave the component out"
            )
        sp = species(key)
        parts[sp] = parts.get(sp, 0.0) + y
    total = sum(parts.values())
    if abs(total - 1.0) > 0.02:
        raise InputValueError(
            f"the mole fractions of {name} add up to {total:.4g}, not 1; pass a composition that "
            "sums to 1 (it is renormalised within 2 %)"
        )
    return tuple(sorted(((sp, y / total) for sp, y in parts.items()), key=lambda p: p[0].name))


def describe_medium(medium: MediumLike, name: str = "medium") -> str:
    """Label a medium by its resolved name, or by its composition."""
    if is_composition(medium):
        comp = _composition(medium, name)  # type: ignore[arg-type]
        if len(comp) == 1:
            return comp[0][0].name
        return "mixture(" + ", ".join(f"{sp.name} {y:.4g}" for sp, y in comp) + ")"
    return species(medium).name  # type: ignore[arg-type]


def property_override(name: str, value: Override, unit: str) -> Callable[[FloatOrArray], FloatOrArray] | None:
    """Check a user's property value once and return it as a function of T (None if not given)."""
    if value is None:
        return None
    if callable(value):
        fn = value

        def call(T: FloatOrArray) -> FloatOrArray:
            out = fn(T)
            return check_positive(
                name, out, f"the {name} function you passed must return positive, finite values [{unit}]"
            )

        return call
    checked = check_positive(name, value, f"pass {name} as a positive number [{unit}] or a function of T")

    def constant(T: FloatOrArray) -> FloatOrArray:
        return checked

    return constant


@dataclass(frozen=True, eq=False)
class GasSide:
    """Properties of the gas side seen by one solute, as functions of T (and P), with overrides.

    Attributes
    ----------
    solute : Species
        The transferring species.
    label : str
        The medium's name, or its composition.
    molar_mass : float
        Molar mass of the medium [kg/mol].
    user_supplied : tuple of str
        Names of the properties the user supplied.
    diffusivity_method : str
        The method behind D and its stated accuracy, or ``"user-supplied"``.
    diffusivity_uncertainty : float or None
        Relative standard uncertainty of D from the method's stated accuracy [-]; None for a
        diffusivity the user supplied.

    """

    solute: Species
    label: str
    molar_mass: float
    user_supplied: tuple[str, ...]
    diffusivity_method: str
    diffusivity_uncertainty: float | None
    _rho: Callable[[FloatOrArray, FloatOrArray], FloatOrArray]
    _cp: Callable[[FloatOrArray], FloatOrArray]
    _k: Callable[[FloatOrArray], FloatOrArray]
    _mu: Callable[[FloatOrArray], FloatOrArray]
    _D: Callable[[FloatOrArray, FloatOrArray], FloatOrArray]
    _cp_molar: Callable[[FloatOrArray], FloatOrArray]
    T_min: float
    T_max: float

    def density(self, T: FloatOrArray, P: FloatOrArray) -> FloatArray:
        """Density [kg/m^3]."""
        return np.asarray(self._rho(T, P), dtype=float)

    def heat_capacity(self, T: FloatOrArray) -> FloatArray:
        """Specific heat capacity [J/(kg K)]."""
        return np.asarray(self._cp(T), dtype=float)

    def molar_heat_capacity(self, T: FloatOrArray) -> FloatArray:
        """Molar heat capacity [J/(mol K)]."""
        return np.asarray(self._cp_molar(T), dtype=float)

    def thermal_conductivity(self, T: FloatOrArray) -> FloatArray:
        """Thermal conductivity [W/(m K)]."""
        return np.asarray(self._k(T), dtype=float)

    def viscosity(self, T: FloatOrArray) -> FloatArray:
        """Dynamic viscosity [Pa s]."""
        return np.asarray(self._mu(T), dtype=float)

    def diffusivity(self, T: FloatOrArray, P: FloatOrArray) -> FloatArray:
        """Diffusivity of the solute in the medium [m^2/s]."""
        return np.asarray(self._D(T, P), dtype=float)


def gas_side(
    solute: str | Species,
    medium: MediumLike,
    *,
    name: str = "medium",
    diffusivity_method: str | None = None,
    rho: Override = None,
    cp: Override = None,
    k: Override = None,
    mu: Override = None,
    D: Override = None,
) -> GasSide:
    """Resolve the gas-side properties of ``medium`` for ``solute``, with the user's overrides.

    A property the user supplies is never looked up, so a medium or solute missing from the
    databases works once every property it would need is given.
    """
    from .._uncertainty import stated_uncertainty
    from ..diffusivity._gas import binary_in_mixture, blanc, gas_diffusivity, ready_gas

    a = species(solute)
    method = diffusivity_method  # None: each binary's published default (the method records)
    if method is not None and not isinstance(method, str):
        raise InputTypeError(f"diffusivity_method={method!r} must be a method name (a string)")
    over = {
        "rho": property_override("rho", rho, "kg/m^3"),
        "cp": property_override("cp", cp, "J/(kg K)"),
        "k": property_override("k", k, "W/(m K)"),
        "mu": property_override("mu", mu, "Pa s"),
        "D": property_override("D", D, "m^2/s"),
    }
    supplied = tuple(key for key, fn in over.items() if fn is not None)
    comp = _composition(medium, name) if isinstance(medium, Mapping) else ((species(medium), 1.0),)
    label = describe_medium(medium, name)
    sps = [sp for sp, _ in comp]
    ys = [y for _, y in comp]
    M = float(sum(y * sp.molar_mass for sp, y in comp))
    needs_models = any(over[key] is None for key in ("cp", "k", "mu"))
    models = []
    T_min, T_max = 0.0, math.inf
    if needs_models:
        from ..substances._properties import gas_model

        models = [gas_model(sp) for sp in sps]
        T_min = max(m.T_min for m in models)
        T_max = min(m.T_max for m in models)
    mws = [sp.molar_mass * 1000.0 for sp in sps]

    def cp_molar(T: FloatOrArray) -> FloatOrArray:
        total: FloatArray = np.zeros(np.shape(T))
        for m, y in zip(models, ys, strict=True):
            total = total + y * np.asarray(m.cp_molar(T), dtype=np.float64)
        return total

    def cp_mass(T: FloatOrArray) -> FloatOrArray:
        return np.asarray(cp_molar(T), dtype=np.float64) / M

    def mu_mix(T: FloatOrArray) -> FloatOrArray:
        if len(models) == 1:
            return models[0].viscosity(T)
        from chemicals.viscosity import Wilke

        mus: list[Any] = [np.asarray(m.viscosity(T)) for m in models]  # the rule is plain arithmetic
        return np.asarray(Wilke(ys, mus, mws), dtype=np.float64)

    def k_mix(T: FloatOrArray) -> FloatOrArray:
        if len(models) == 1:
            return models[0].thermal_conductivity(T)
        from chemicals.thermal_conductivity import Wassiljewa_Herning_Zipperer

        ks: list[Any] = [np.asarray(m.thermal_conductivity(T)) for m in models]
        return np.asarray(Wassiljewa_Herning_Zipperer(ys, ks, mws), dtype=np.float64)

    def rho_ideal(T: FloatOrArray, P: FloatOrArray) -> FloatOrArray:
        return np.asarray(P, dtype=np.float64) * M / (R_GAS * np.asarray(T, dtype=np.float64))

    others = [(sp, y) for sp, y in comp if sp != a]
    if over["D"] is None and not others:
        raise InputValueError(
            f"{name} consists only of {a.name!r}, the transferring species itself; pass a medium "
            "it diffuses through"
        )

    def D_mix(T: FloatOrArray, P: FloatOrArray) -> FloatOrArray:
        if len(others) == 1 and len(comp) == 1:
            return gas_diffusivity(a, others[0][0], T, P, method=method)
        # each component a vapour at its partial pressure (water at 3 % in humid air)
        Ds = [np.asarray(binary_in_mixture(a, sp, T, P, y, method)) for sp, y in others]
        if len(others) == 1:
            return Ds[0] if Ds[0].ndim else float(Ds[0])
        stacked = np.stack(np.broadcast_arrays(*Ds), axis=-1)
        return blanc(stacked, [y for _, y in others])

    def pick(
        key: str, default: Callable[[FloatOrArray], FloatOrArray]
    ) -> Callable[[FloatOrArray], FloatOrArray]:
        fn = over[key]
        return default if fn is None else fn

    rho_fn = over["rho"]
    D_fn = over["D"]
    if D_fn is None:
        records = [ready_gas(a, sp, method).record for sp, _ in others]
        names = "/".join(dict.fromkeys(r.name for r in records))
        pct = max(r.accuracy_pct for r in records)
        d_method = f"{names} (stated accuracy about {pct:g} %)"
        if len(others) > 1:
            d_method = f"{names} binaries combined by Blanc's law (stated accuracy about {pct:g} %)"
        u_D = max((u for r in records if (u := stated_uncertainty(r)) is not None), default=None)
    else:
        d_method, u_D = "user-supplied", None
    return GasSide(
        solute=a,
        label=label,
        molar_mass=M,
        user_supplied=supplied,
        diffusivity_method=d_method,
        diffusivity_uncertainty=u_D,
        _rho=rho_ideal if rho_fn is None else (lambda T, P: rho_fn(T)),
        _cp=pick("cp", cp_mass),
        _k=pick("k", k_mix),
        _mu=pick("mu", mu_mix),
        _D=D_mix if D_fn is None else (lambda T, P: D_fn(T)),
        _cp_molar=cp_molar if over["cp"] is None else (lambda T: np.asarray(over["cp"](T)) * M),  # type: ignore[misc]
        T_min=T_min,
        T_max=T_max,
    )


@dataclass(frozen=True, eq=False)
class LiquidSide:
    """Properties of an evaporating liquid and its vapour as functions of T, with overrides.

    Attributes
    ----------
    species : Species
        The liquid.
    T_min, T_max : float
        Range covered by the property models used [K] (0 and inf where the user supplied all).
    user_supplied : tuple of str
        Names of the properties the user supplied.

    """

    species: Species
    T_min: float
    T_max: float
    user_supplied: tuple[str, ...]
    _psat: Callable[[FloatOrArray], FloatOrArray]
    _latent: Callable[[FloatOrArray], FloatOrArray]
    _cp_vapour: Callable[[FloatOrArray], FloatOrArray]
    _cp_liquid: Callable[[FloatOrArray], FloatOrArray]

    def vapour_pressure(self, T: FloatOrArray) -> FloatArray:
        """Vapour pressure [Pa]."""
        return np.asarray(self._psat(T), dtype=float)

    def latent_heat(self, T: FloatOrArray) -> FloatArray:
        """Specific enthalpy of vaporisation [J/kg]."""
        return np.asarray(self._latent(T), dtype=float)

    def vapour_heat_capacity(self, T: FloatOrArray) -> FloatArray:
        """Specific heat capacity of the vapour [J/(kg K)]."""
        return np.asarray(self._cp_vapour(T), dtype=float)

    def liquid_heat_capacity(self, T: FloatOrArray) -> FloatArray:
        """Specific heat capacity of the liquid [J/(kg K)]."""
        return np.asarray(self._cp_liquid(T), dtype=float)


def liquid_side(
    liquid: str | Species,
    *,
    vapour_pressure: Override = None,
    latent_heat: Override = None,
    cp_vapour: Override = None,
    cp_liquid: Override = None,
) -> LiquidSide:
    """Resolve the evaporating liquid's properties, with the user's overrides.

    A property the user supplies is never looked up, so a liquid missing from the databases
    works once its vapour pressure, latent heat and vapour heat capacity are given.
    """
    a = species(liquid)
    over = {
        "vapour_pressure": property_override("vapour_pressure", vapour_pressure, "Pa"),
        "latent_heat": property_override("latent_heat", latent_heat, "J/kg"),
        "cp_vapour": property_override("cp_vapour", cp_vapour, "J/(kg K)"),
        "cp_liquid": property_override("cp_liquid", cp_liquid, "J/(kg K)"),
    }
    supplied = tuple(key for key, fn in over.items() if fn is not None)
    lows: list[float] = []
    highs: list[float] = []
    fns: dict[str, Callable[[FloatOrArray], FloatOrArray]] = {}
    from ..substances._properties import liquid_model

    if over["vapour_pressure"] is None or over["latent_heat"] is None:
        lq = liquid_model(a)
        if over["vapour_pressure"] is None:
            if lq.psat is None:
                raise MissingConstantError(
                    f"thermo has no vapour pressure for {a.name!r}; pass vapour_pressure=... "
                    "(a function of T [K] returning Pa)"
                )
            lows.append(lq.psat.T_min)
            highs.append(lq.psat.T_max)
            fns["vapour_pressure"] = lq.psat
        if over["latent_heat"] is None:
            if lq.hvap is None:
                raise MissingConstantError(
                    f"thermo has no enthalpy of vaporisation for {a.name!r}; pass latent_heat=... [J/kg]"
                )
            lows.append(lq.hvap.T_min)
            highs.append(lq.hvap.T_max)
            fns["latent_heat"] = lq.enthalpy_vaporization

    def cp_liquid_model(T: FloatOrArray) -> FloatOrArray:
        return liquid_model(a).heat_capacity(T)  # looked up only when an enthalpy needs it

    fns["cp_liquid"] = cp_liquid_model
    if over["cp_vapour"] is None:
        from ..substances._properties import gas_model

        try:
            vap = gas_model(a)
        except MassTransferError as exc:
            raise MissingConstantError(
                f"no vapour heat capacity for {a.name!r} ({exc}); pass cp_vapour=... [J/(kg K)], "
                "a number or a function of T [K]"
            ) from exc
        lo_cp, hi_cp = vap.cp_molar.T_min, vap.cp_molar.T_max

        def cp_vapour_model(T: FloatOrArray) -> FloatOrArray:
            # a small correction (sensible heat of the vapour): held at the ends of its fitted
            # range rather than restricting the liquid's temperatures to that range
            return vap.heat_capacity(np.clip(T, lo_cp, hi_cp))

        fns["cp_vapour"] = cp_vapour_model
    for key, fn in over.items():
        if fn is not None:
            fns[key] = fn
    for value in (vapour_pressure, latent_heat):
        # a user's curve that states its range (as the library's own curves do) keeps it
        lo, hi = getattr(value, "T_min", None), getattr(value, "T_max", None)
        if isinstance(lo, float | int) and isinstance(hi, float | int) and 0 < lo < hi:
            lows.append(float(lo))
            highs.append(float(hi))
    return LiquidSide(
        species=a,
        T_min=max(lows, default=0.0),
        T_max=min(highs, default=math.inf),
        user_supplied=supplied,
        _psat=fns["vapour_pressure"],
        _latent=fns["latent_heat"],
        _cp_vapour=fns["cp_vapour"],
        _cp_liquid=fns["cp_liquid"],
    )
