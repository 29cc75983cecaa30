"""Carrier-gas and solvent-liquid properties over arrays of temperature.

Each property comes from ``thermo``'s temperature-dependent model for the
species (the method ``thermo`` ranks first).  The model is resolved once per
species, sampled at Chebyshev points over the range its method covers, and
replaced by a Chebyshev interpolant whose accuracy against the ``thermo``
model is verified when it is built (relative error below
:data:`INTERPOLATION_RTOL` at the midpoints between nodes).  Evaluating the
interpolant is plain numpy arithmetic, so a million temperatures cost
milliseconds, where building a ``thermo`` object per state would cost tens of
milliseconds each.

A temperature outside the range of the underlying model raises
:class:`~masstransfer.errors.OutOfRangeError`; for a solvent this includes
any temperature at which it is not a liquid (below its melting point or
above its critical point).

Gas density is the ideal-gas value :math:`\\rho = PM/(RT)`; gas viscosity,
thermal conductivity and heat capacity are the low-pressure values.  They
suit carrier gases up to a few bar away from their critical point.  Air is
treated as a mixture of N2, O2 and Ar (composition in
:data:`masstransfer._tables.AIR`) with the Wilke viscosity and Wassiljewa
(Herning-Zipperer) conductivity mixing rules of ``chemicals``.
"""

from __future__ import annotations

import functools
import math
from collections.abc import Callable
from dataclasses import dataclass
from typing import Any

import numpy as np
from numpy.polynomial import chebyshev as _cheb

from .. import _tables as data
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_positive, check_shapes, finish, guard, warn_caller
from ..constants import DEBYE, R_GAS
from ..errors import EnvelopeWarning, MissingConstantError, OutOfRangeError
from ._databases import quiet
from ._species import Species, species

__all__ = [
    "INTERPOLATION_RTOL",
    "GasModel",
    "LiquidModel",
    "PropertyCurve",
    "gas_model",
    "henry_constant",
    "liquid_model",
    "parachor",
]

#: Largest relative deviation allowed between an interpolant and its model.
INTERPOLATION_RTOL = 1e-7


@dataclass(frozen=True, eq=False)
class PropertyCurve:
    """One temperature-dependent property as a verified Chebyshev interpolant.

    Parameters
    ----------
    quantity : str
        What it is, e.g. ``"viscosity of liquid water"``.
    unit : str
        SI unit of the values.
    source : str
        The ``thermo`` model and method it reproduces.
    T_min : float
        Lowest temperature covered [K].
    T_max : float
        Highest temperature covered [K].
    coefficients : numpy.ndarray
        Chebyshev coefficients of the (log of the) property on [T_min, T_max].

    """

    quantity: str
    unit: str
    source: str
    T_min: float
    T_max: float
    coefficients: FloatArray

    @guard
    def __call__(self, T: ArrayLike) -> FloatOrArray:
        """Evaluate at temperatures ``T`` [K]; returns values in :attr:`unit`."""
        Tv = check_positive("T", T)
        self.check_range(Tv)
        x = (2.0 * Tv - (self.T_min + self.T_max)) / (self.T_max - self.T_min)
        return finish(np.exp(_cheb.chebval(x, self.coefficients)))

    def check_range(self, T: FloatOrArray) -> None:
        """Raise :class:`OutOfRangeError` if any ``T`` lies outside the curve."""
        if isinstance(T, float):
            bad = not (self.T_min <= T <= self.T_max)
            shown = T
        else:
            mask = (self.T_min > T) | (self.T_max < T)
            bad = bool(mask.any())
            shown = float(np.asarray(T)[mask].ravel()[0]) if bad else 0.0
        if bad:
            raise OutOfRangeError(
                f"T={shown!r} K is outside {self.T_min:.2f}-{self.T_max:.2f} K, the range of the "
                f"{self.quantity} model ({self.source}); pass T within that range or supply the "
                "property yourself"
            )


def _fit(
    quantity: str,
    unit: str,
    source: str,
    func: Callable[[float], float],
    T_min: float,
    T_max: float,
) -> PropertyCurve:
    """Interpolate ``func`` (positive) in log space, doubling nodes until accurate."""
    if not (T_max > T_min):
        raise OutOfRangeError(f"the {quantity} model ({source}) covers no temperature range")
    mid = 0.5 * (T_min + T_max)
    half = 0.5 * (T_max - T_min)
    worst = math.inf
    for n in (16, 32, 64, 128, 256):
        x = _cheb.chebpts1(n)
        values = np.array([func(mid + half * xi) for xi in x])
        if not np.all(np.isfinite(values)) or np.any(values <= 0.0):
            raise OutOfRangeError(
                f"the {quantity} model ({source}) gives non-positive values within "
                f"{T_min:.2f}-{T_max:.2f} K; supply the property yourself"
            )
        coef = _cheb.chebfit(x, np.log(values), n - 1)
        # check at points between the nodes
        xm = np.cos(np.pi * np.arange(1, n) / n)
        exact = np.array([func(mid + half * xi) for xi in xm])
        approx = np.exp(_cheb.chebval(xm, coef))
        worst = float(np.max(np.abs(approx / exact - 1.0)))
        if worst < INTERPOLATION_RTOL:
            return PropertyCurve(quantity, unit, source, T_min, T_max, coef)
    raise OutOfRangeError(
        f"the {quantity} model ({source}) could not be interpolated to "
        f"{INTERPOLATION_RTOL:g} (reached {worst:.1e}); supply the property yourself"
    )


def _thermo_curve(
    prop: Any, quantity: str, unit: str, scale: float, T_low: float, T_high: float
) -> PropertyCurve:
    method = prop.method
    if method is None:
        raise MissingConstantError(f"thermo has no model for the {quantity}; supply the property yourself")
    lo, hi = prop.T_limits[method]
    lo, hi = max(lo, T_low), min(hi, T_high)

    def f(T: float) -> float:
        return float(prop.calculate(T, method)) * scale

    return _fit(quantity, unit, f"thermo {type(prop).__name__}, method {method}", f, lo, hi)


def _thermo_kwargs(sp: Species) -> dict[str, Any]:
    return {
        "CASRN": sp.CAS or "",
        "MW": sp.molar_mass * 1000.0,
        "Tc": sp.Tc,
        "Pc": sp.Pc,
        "Vc": sp.Vc,
        "omega": sp.omega,
    }


@dataclass(frozen=True, eq=False)
class GasModel:
    """Low-pressure properties of one carrier gas over temperature.

    Built by :func:`gas_model`.  Attributes are :class:`PropertyCurve`
    objects; methods evaluate them for arrays of T (and P for density).
    """

    species: Species
    mu: PropertyCurve
    k: PropertyCurve
    cp_molar: PropertyCurve

    @property
    def T_min(self) -> float:
        """Lowest temperature all curves cover [K]."""
        return max(self.mu.T_min, self.k.T_min, self.cp_molar.T_min)

    @property
    def T_max(self) -> float:
        """Highest temperature all curves cover [K]."""
        return min(self.mu.T_max, self.k.T_max, self.cp_molar.T_max)

    @guard
    def density(self, T: ArrayLike, P: ArrayLike = 101325.0) -> FloatOrArray:
        """Ideal-gas density [kg/m^3] at ``T`` [K] and ``P`` [Pa]."""
        Tv = check_positive("T", T)
        Pv = check_positive("P", P)
        check_shapes(T=Tv, P=Pv)
        return finish(Pv * self.species.molar_mass / (R_GAS * Tv))

    @guard
    def viscosity(self, T: ArrayLike) -> FloatOrArray:
        """Dynamic viscosity [Pa s] at ``T`` [K]."""
        return self.mu(T)

    @guard
    def thermal_conductivity(self, T: ArrayLike) -> FloatOrArray:
        """Thermal conductivity [W/(m K)] at ``T`` [K]."""
        return self.k(T)

    @guard
    def heat_capacity(self, T: ArrayLike) -> FloatOrArray:
        """Isobaric specific heat capacity [J/(kg K)] at ``T`` [K]."""
        return finish(np.asarray(self.cp_molar(T)) / self.species.molar_mass)

    @guard
    def kinematic_viscosity(self, T: ArrayLike, P: ArrayLike = 101325.0) -> FloatOrArray:
        """Kinematic viscosity [m^2/s] at ``T`` [K] and ``P`` [Pa]."""
        return finish(np.asarray(self.viscosity(T)) / np.asarray(self.density(T, P)))

    @guard
    def prandtl(self, T: ArrayLike) -> FloatOrArray:
        """Prandtl number [-] at ``T`` [K]."""
        cp = np.asarray(self.heat_capacity(T))
        return finish(cp * np.asarray(self.viscosity(T)) / np.asarray(self.thermal_conductivity(T)))


@dataclass(frozen=True, eq=False)
class LiquidModel:
    """Properties of one solvent liquid (saturated) over temperature.

    Built by :func:`liquid_model`.  The range of every curve is limited to
    the liquid range (melting point to critical point) as well as to the
    range of the underlying ``thermo`` method.
    """

    species: Species
    molar_volume: PropertyCurve
    mu: PropertyCurve
    k: PropertyCurve
    cp_molar: PropertyCurve
    psat: PropertyCurve | None = None
    hvap: PropertyCurve | None = None

    @property
    def T_min(self) -> float:
        """Lowest temperature of the viscosity and density models [K]."""
        return max(self.mu.T_min, self.molar_volume.T_min)

    @property
    def T_max(self) -> float:
        """Highest temperature of the viscosity and density models [K]."""
        return min(self.mu.T_max, self.molar_volume.T_max)

    @guard
    def density(self, T: ArrayLike) -> FloatOrArray:
        """Saturated-liquid density [kg/m^3] at ``T`` [K]."""
        return finish(self.species.molar_mass / np.asarray(self.molar_volume(T)))

    @guard
    def viscosity(self, T: ArrayLike) -> FloatOrArray:
        """Dynamic viscosity [Pa s] at ``T`` [K]."""
        return self.mu(T)

    @guard
    def thermal_conductivity(self, T: ArrayLike) -> FloatOrArray:
        """Thermal conductivity [W/(m K)] at ``T`` [K]."""
        return self.k(T)

    @guard
    def heat_capacity(self, T: ArrayLike) -> FloatOrArray:
        """Isobaric specific heat capacity [J/(kg K)] at ``T`` [K]."""
        return finish(np.asarray(self.cp_molar(T)) / self.species.molar_mass)

    @guard
    def vapor_pressure(self, T: ArrayLike) -> FloatOrArray:
        """Saturation (vapour) pressure [Pa] at ``T`` [K]."""
        return self._need(self.psat, "vapour pressure")(T)

    @guard
    def enthalpy_vaporization(self, T: ArrayLike) -> FloatOrArray:
        """Specific enthalpy of vaporisation [J/kg] at ``T`` [K]."""
        return finish(
            np.asarray(self._need(self.hvap, "enthalpy of vaporisation")(T)) / self.species.molar_mass
        )

    @guard
    def surface_tension(self, T: ArrayLike) -> FloatOrArray:
        """Surface tension against its vapour or air [N/m] at ``T`` [K] (built on first use)."""
        return self._need(_surface_tension(self.species), "surface tension")(T)

    def _need(self, curve: PropertyCurve | None, what: str) -> PropertyCurve:
        if curve is None:
            raise MissingConstantError(
                f"thermo has no {what} model for {self.species.name!r}; supply the value yourself"
            )
        return curve


@guard
def gas_model(gas: str | Species) -> GasModel:
    """Resolve the carrier-gas property models of ``gas`` (cached per species).

    Parameters
    ----------
    gas : str or Species
        The carrier gas, e.g. ``"air"``, ``"nitrogen"``, ``"CO2"``.

    Returns
    -------
    GasModel
        Viscosity [Pa s], thermal conductivity [W/(m K)] and heat capacity
        [J/(kg K)] over temperature, and ideal-gas density.

    Notes
    -----
    The models are ``thermo``'s; their accuracy is that of the method
    ``thermo`` selects (for common gases, fits to reference equations,
    typically within 1-3 %).

    References
    ----------
    Bell, C. et al. (2016-2024). thermo: Chemical properties component of
    the Chemical Engineering Design Library. https://github.com/CalebBell/thermo

    Examples
    --------
    >>> air = gas_model("air")
    >>> round(air.viscosity(300.0) * 1e6, 1)
    18.5

    """
    return _gas_model(species(gas))


@guard
def liquid_model(liquid: str | Species) -> LiquidModel:
    """Resolve the solvent-liquid property models of ``liquid`` (cached per species).

    Parameters
    ----------
    liquid : str or Species
        The solvent, e.g. ``"water"``, ``"ethanol"``.

    Returns
    -------
    LiquidModel
        Saturated-liquid density [kg/m^3], viscosity [Pa s], thermal
        conductivity [W/(m K)] and heat capacity [J/(kg K)] over temperature.

    Notes
    -----
    The models are ``thermo``'s; liquid viscosity is its most uncertain
    property (a few per cent for common solvents, much more for estimated
    ones).

    References
    ----------
    Bell, C. et al. (2016-2024). thermo: Chemical properties component of
    the Chemical Engineering Design Library. https://github.com/CalebBell/thermo

    Examples
    --------
    >>> water = liquid_model("water")
    >>> round(water.viscosity(298.15) * 1e3, 3)
    0.89

    """
    return _liquid_model(species(liquid))


@functools.lru_cache(maxsize=128)
def _gas_model(sp: Species) -> GasModel:
    with quiet():
        return _build_gas_model(sp)


def _build_gas_model(sp: Species) -> GasModel:
    if sp.name == "air" and sp.CAS is None:
        return _air_model(sp)
    if not sp.CAS:
        raise MissingConstantError(
            f"species {sp.name!r} has no CAS number, so thermo has no property models for it; "
            "supply rho, mu, k and cp yourself"
        )
    from thermo import HeatCapacityGas, ThermalConductivityGas, ViscosityGas

    kw = _thermo_kwargs(sp)
    dip = None if sp.dipole is None else sp.dipole / DEBYE
    mu = ViscosityGas(CASRN=kw["CASRN"], MW=kw["MW"], Tc=sp.Tc, Pc=sp.Pc, dipole=dip)
    cp = HeatCapacityGas(CASRN=kw["CASRN"], MW=kw["MW"])
    k = ThermalConductivityGas(
        CASRN=kw["CASRN"],
        MW=kw["MW"],
        Tb=sp.Tb,
        Tc=sp.Tc,
        Pc=sp.Pc,
        Vc=sp.Vc,
        omega=sp.omega,
        dipole=dip,
    )
    name = f"gaseous {sp.name}"
    return GasModel(
        species=sp,
        mu=_thermo_curve(mu, f"viscosity of {name}", "Pa s", 1.0, 0.0, math.inf),
        k=_thermo_curve(k, f"thermal conductivity of {name}", "W/(m K)", 1.0, 0.0, math.inf),
        cp_molar=_thermo_curve(cp, f"heat capacity of {name}", "J/(mol K)", 1.0, 0.0, math.inf),
    )


def _air_model(sp: Species) -> GasModel:
    from chemicals.thermal_conductivity import Wassiljewa_Herning_Zipperer
    from chemicals.viscosity import Wilke

    comp: tuple[tuple[str, float], ...] = data.AIR["composition"]  # type: ignore[assignment]
    parts = [_gas_model(species(cas)) for cas, _ in comp]
    ys = [y / sum(y for _, y in comp) for _, y in comp]
    mws = [p.species.molar_mass * 1000.0 for p in parts]
    lo = max(max(p.mu.T_min, p.k.T_min, p.cp_molar.T_min) for p in parts)
    hi = min(min(p.mu.T_max, p.k.T_max, p.cp_molar.T_max) for p in parts)
    src = "chemicals mixing rule over thermo models of N2, O2, Ar"

    def mu(T: float) -> float:
        return float(Wilke(ys, [float(p.mu(T)) for p in parts], mws))

    def k(T: float) -> float:
        return float(Wassiljewa_Herning_Zipperer(ys, [float(p.k(T)) for p in parts], mws))

    def cp(T: float) -> float:
        return sum(y * float(p.cp_molar(T)) for y, p in zip(ys, parts, strict=True))

    return GasModel(
        species=sp,
        mu=_fit("viscosity of air", "Pa s", "Wilke rule; " + src, mu, lo, hi),
        k=_fit("thermal conductivity of air", "W/(m K)", "Wassiljewa rule; " + src, k, lo, hi),
        cp_molar=_fit("heat capacity of air", "J/(mol K)", "mole average; " + src, cp, lo, hi),
    )


@functools.lru_cache(maxsize=128)
def _liquid_model(sp: Species) -> LiquidModel:
    with quiet():
        return _build_liquid_model(sp)


def _build_liquid_model(sp: Species) -> LiquidModel:
    if not sp.CAS:
        raise MissingConstantError(
            f"species {sp.name!r} has no CAS number, so thermo has no liquid models for it; "
            "pass the solvent viscosity (and other properties) yourself"
        )
    from thermo import (
        HeatCapacityLiquid,
        ThermalConductivityLiquid,
        ViscosityLiquid,
        VolumeLiquid,
    )

    kw = _thermo_kwargs(sp)
    T_low = sp.Tm if sp.Tm is not None else 0.0
    T_high = sp.Tc if sp.Tc is not None else math.inf
    dip = None if sp.dipole is None else sp.dipole / DEBYE
    vl = VolumeLiquid(
        CASRN=kw["CASRN"],
        MW=kw["MW"],
        Tb=sp.Tb,
        Tc=sp.Tc,
        Pc=sp.Pc,
        Vc=sp.Vc,
        omega=sp.omega,
        dipole=dip,
    )
    mu = ViscosityLiquid(
        CASRN=kw["CASRN"], MW=kw["MW"], Tm=sp.Tm, Tc=sp.Tc, Pc=sp.Pc, Vc=sp.Vc, omega=sp.omega
    )
    k = ThermalConductivityLiquid(
        CASRN=kw["CASRN"], MW=kw["MW"], Tm=sp.Tm, Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, omega=sp.omega
    )
    cp = HeatCapacityLiquid(CASRN=kw["CASRN"], MW=kw["MW"], Tc=sp.Tc, omega=sp.omega)
    from thermo import EnthalpyVaporization, VaporPressure

    vp = VaporPressure(CASRN=kw["CASRN"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, omega=sp.omega)
    hv = EnthalpyVaporization(CASRN=kw["CASRN"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, omega=sp.omega)
    name = f"liquid {sp.name}"
    T_hv_high = T_high if not math.isfinite(T_high) else T_high * 0.995  # Hvap -> 0 at Tc
    return LiquidModel(
        species=sp,
        molar_volume=_thermo_curve(vl, f"molar volume of {name}", "m^3/mol", 1.0, T_low, T_high),
        mu=_thermo_curve(mu, f"viscosity of {name}", "Pa s", 1.0, T_low, T_high),
        k=_thermo_curve(k, f"thermal conductivity of {name}", "W/(m K)", 1.0, T_low, T_high),
        cp_molar=_thermo_curve(cp, f"heat capacity of {name}", "J/(mol K)", 1.0, T_low, T_high),
        psat=_optional_curve(vp, f"vapour pressure of {name}", "Pa", T_low, T_high),
        hvap=_optional_curve(hv, f"enthalpy of vaporisation of {name}", "J/mol", T_low, T_hv_high),
    )


@functools.lru_cache(maxsize=64)
def _surface_tension(sp: Species) -> PropertyCurve | None:
    """Surface tension up to 0.9 Tc (it vanishes at Tc, where its logarithm cannot be interpolated).

    Built on first use only: the liquid models most callers need do not load its tables.
    """
    if not sp.CAS:
        return None
    from thermo import SurfaceTension

    kw = _thermo_kwargs(sp)
    T_low = sp.Tm if sp.Tm is not None else 0.0
    T_high = sp.Tc if sp.Tc is not None else math.inf
    top = T_high if not math.isfinite(T_high) else T_low + 0.9 * (T_high - T_low)
    with quiet(), np.errstate(over="ignore", under="ignore", invalid="ignore", divide="ignore"):
        st = SurfaceTension(
            CASRN=kw["CASRN"], MW=kw["MW"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, Vc=sp.Vc, omega=sp.omega
        )
        return _optional_curve(st, f"surface tension of liquid {sp.name}", "N/m", T_low, top)


def _optional_curve(prop: Any, quantity: str, unit: str, T_low: float, T_high: float) -> PropertyCurve | None:
    if prop.method is None:
        return None
    try:
        return _thermo_curve(prop, quantity, unit, 1.0, T_low, T_high)
    except (OutOfRangeError, MissingConstantError):
        return None


#: Temperature at which the parachor is evaluated when the liquid exists there [K].
_PARACHOR_T = 298.15


@guard
def parachor(liquid: str | Species) -> float:
    """Parachor of a species from its surface tension and liquid density.

    .. math:: \\mathcal{P} = \\frac{\\sigma^{1/4} M}{\\rho_L - \\rho_V}

    evaluated by ``chemicals.Parachor`` with ``thermo``'s surface-tension
    and liquid-volume models at 298.15 K, or at the normal boiling point
    for species that are not liquid at 298.15 K (the vapour density is
    neglected).  A user-supplied ``Species.parachor`` is returned as is.

    Parameters
    ----------
    liquid : str or Species
        The species.

    Returns
    -------
    float
        Parachor [N^0.25 m^2.75/mol] (multiply by 5.623413e6 for the
        tabulated cm^3 g^0.25 s^-0.5 mol^-1 form).

    Notes
    -----
    The parachor varies by about 1 % over the liquid range (Poling et al.
    2001, Section 12-3), so one reference temperature serves.

    References
    ----------
    Sugden, S. (1924). *J. Chem. Soc., Trans.* 125, 1177-1189.
    https://doi.org/10.1039/CT9242501177

    Examples
    --------
    >>> round(parachor("water") * 5.623413e6, 1)
    52.6

    """
    return _parachor(species(liquid))


@functools.lru_cache(maxsize=256)
def _parachor(sp: Species) -> float:
    with quiet():
        return _compute_parachor(sp)


def _compute_parachor(sp: Species) -> float:
    if sp.parachor is not None:
        return sp.parachor
    if not sp.CAS:
        raise MissingConstantError(
            f"species {sp.name!r} has no CAS number and no parachor; supply "
            "Species(..., parachor=...) [N^0.25 m^2.75/mol]"
        )
    from chemicals import Parachor
    from thermo import SurfaceTension, VolumeLiquid

    kw = _thermo_kwargs(sp)
    st = SurfaceTension(
        CASRN=kw["CASRN"], MW=kw["MW"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, Vc=sp.Vc, omega=sp.omega
    )
    vl = VolumeLiquid(CASRN=kw["CASRN"], MW=kw["MW"], Tb=sp.Tb, Tc=sp.Tc, Pc=sp.Pc, Vc=sp.Vc, omega=sp.omega)
    if st.method is None or vl.method is None:
        raise MissingConstantError(
            f"thermo has no surface tension or liquid density for {sp.name!r}, so its parachor "
            "is unknown; supply Species(..., parachor=...) [N^0.25 m^2.75/mol]"
        )
    lo1, hi1 = st.T_limits[st.method]
    lo2, hi2 = vl.T_limits[vl.method]
    candidates = [_PARACHOR_T] + ([sp.Tb] if sp.Tb is not None else [])
    candidates.append(0.5 * (max(lo1, lo2) + min(hi1, hi2)))
    for T in candidates:
        if (sp.Tm is None or sp.Tm < T) and max(lo1, lo2) <= T <= min(hi1, hi2):
            sigma = float(st.calculate(T, st.method))
            rho = sp.molar_mass / float(vl.calculate(T, vl.method))
            value = float(Parachor(sp.molar_mass * 1000.0, rho, 0.0, sigma))
            if math.isfinite(value) and value > 0:
                return value
    raise MissingConstantError(
        f"no temperature found at which thermo models both the surface tension and density of "
        f"{sp.name!r}; supply Species(..., parachor=...) [N^0.25 m^2.75/mol]"
    )


_HENRY_TABLES = ("Sander T dep", "ChemSep Henry", "Sander Const")


@guard
def henry_constant(solute: str | Species, solvent: str | Species, T: ArrayLike) -> FloatOrArray:
    """Henry's-law constant of a dilute gas in a solvent, :math:`p_A = H\\,x_A`.

    .. math:: H = \\exp\\left(A + \\frac{B}{T} + C\\ln T + DT + \\frac{E}{T^2} + FT^2\\right)

    with the coefficients of the first of the ``thermo`` interaction-parameter
    tables that holds the pair: Sander's temperature-dependent compilation,
    the ChemSep set, then Sander's constants.

    Parameters
    ----------
    solute : str or Species
        Dissolved gas, e.g. ``"oxygen"``.
    solvent : str or Species
        Solvent, e.g. ``"water"``.
    T : float or array_like
        Temperature [K].

    Returns
    -------
    float or numpy.ndarray
        H [Pa] on the mole-fraction scale (the slope of the equilibrium line
        is m = H/P).

    Raises
    ------
    MissingConstantError
        If none of the tables holds the pair; pass your own constant to the
        numeric functions instead.

    Notes
    -----
    Compilations scatter by 10-30 % for many gases; Sander (2015) lists the
    spread.  The equation form is the one ``chemicals.Henry_pressure``
    evaluates, written here in numpy for arrays of T.

    References
    ----------
    Sander, R. (2015). Compilation of Henry's law constants (version 4.0)
    for water as solvent. *Atmos. Chem. Phys.* 15, 4399-4981.
    https://doi.org/10.5194/acp-15-4399-2015

    Examples
    --------
    >>> round(henry_constant("oxygen", "water", 298.15) / 1e9, 2)
    4.34

    """
    a, b = species(solute), species(solvent)
    Tv = check_positive("T", T)
    A, B, C, D, E, F = _henry_coefficients(a, b)
    Ta = np.asarray(Tv, dtype=float)
    lo = b.Tm if b.Tm is not None else 0.0
    hi = b.Tc if b.Tc is not None else math.inf
    if Ta.size and (Ta.min() < lo or Ta.max() > hi):
        raise OutOfRangeError(
            f"T from {Ta.min():.6g} to {Ta.max():.6g} K leaves the liquid range of the solvent "
            f"{b.name!r} ({lo:.2f} K melting point to {hi:.2f} K critical point); no Henry's-law "
            "constant exists there"
        )
    if Ta.size and (Ta.min() < _HENRY_T_RANGE[0] or Ta.max() > _HENRY_T_RANGE[1]):
        warn_caller(
            f"henry_constant: T from {Ta.min():.6g} to {Ta.max():.6g} K is outside "
            f"{_HENRY_T_RANGE[0]:g}-{_HENRY_T_RANGE[1]:g} K, where the compiled temperature "
            "dependences (fitted near 298.15 K) are extrapolated; prefer measured solubilities",
            EnvelopeWarning,
        )
    return finish(np.exp(A + (B + E / Ta) / Ta + C * np.log(Ta) + Ta * (D + F * Ta)))


#: Temperatures over which the compiled Henry's-law temperature dependences are used without a
#: warning: the compilations fit van 't Hoff forms to data mostly between the ice point and the
#: normal boiling point of water (Sander 2015, sec. 2.4).
_HENRY_T_RANGE = (273.15, 373.15)


@functools.lru_cache(maxsize=256)
def _henry_coefficients(a: Species, b: Species) -> tuple[float, ...]:
    if not a.CAS or not b.CAS:
        raise MissingConstantError(
            f"no Henry's-law data without CAS numbers ({a.name!r} in {b.name!r}); pass the constant yourself"
        )
    with quiet():
        from thermo.interaction_parameters import IPDB

        for table in _HENRY_TABLES:
            pair = [a.CAS, b.CAS]
            if IPDB.has_ip_specific(table, pair, "A"):
                return tuple(
                    float(IPDB.get_ip_asymmetric_matrix(table, pair, key)[0][1])
                    for key in ("A", "B", "C", "D", "E", "F")
                )
    raise MissingConstantError(
        f"no Henry's-law constant for {a.name!r} in {b.name!r} in the thermo tables "
        f"({', '.join(_HENRY_TABLES)}); pass your own constant to the numeric functions"
    )
