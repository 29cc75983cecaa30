"""Diffusion coefficients of dilute solutes in liquids.

Numbers in: :func:`wilke_chang`, :func:`hayduk_minhas_aqueous`,
:func:`hayduk_minhas`, :func:`hayduk_minhas_paraffin`, :func:`tyn_calus`,
:func:`stokes_einstein`, :func:`nernst_haskell` (strong electrolytes in water).
Names in: :func:`liquid_diffusivity`, which fetches the solvent viscosity from
:mod:`masstransfer.substances` unless the caller passes one, and applies the published
special-case recommendations (documented on :func:`liquid_diffusivity`).

All values are infinite-dilution diffusivities.  Estimates only: typical
errors are 10-20 %; check designs that affect safety against measured data.  Strong
electrolytes (salts, strong acids and bases) in water take :func:`nernst_haskell`; the
molecular correlations refuse them.
"""

from __future__ import annotations

import math
from collections.abc import Mapping
from dataclasses import dataclass
from types import MappingProxyType
from typing import Final, overload

import numpy as np

from .. import _tables as data
from .._frozen import FrozenResult
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_positive, check_shapes, finish, guard, warn_caller
from ..constants import AVOGADRO, BOLTZMANN
from ..errors import EnvelopeWarning, InputValueError, MissingConstantError
from ..substances._species import (
    Origin,
    Species,
    ambiguity_warnings,
    boiling_point_measured,
    le_bas_volume,
    rewarn_ambiguity,
    species,
)
from ._common import normalise_method
from ._ions import ionic_kind, salt_ions
from ._phase import PhaseLimits, check_liquid, phase_limits
from ._records import ClassRule, ConstantUsed, DiffusivityMethod, Prepared, Role, SpeciesClass, classify

__all__ = [
    "LIQUID_METHODS",
    "LiquidDiffusivityInputs",
    "hayduk_minhas",
    "hayduk_minhas_aqueous",
    "hayduk_minhas_paraffin",
    "liquid_default",
    "liquid_diffusivity",
    "liquid_diffusivity_inputs",
    "nernst_haskell",
    "stokes_einstein",
    "tyn_calus",
    "wilke_chang",
]

#: Parachor conversion: SI [N^0.25 m^2.75/mol] -> tabulated cm-g-s form.
_PARACHOR_CGS: Final = 5.623413e6
#: Solvent viscosity above which the correlations warn [Pa s] (Poling et al.
#: 2001, Section 11-10: not for viscous solvents, about 20-30 cP).
VISCOUS_SOLVENT_LIMIT: Final = 0.02

_WATER = "7732-18-5"
_NON_DIMERISING_ACID_SOLVENTS = frozenset(
    {_WATER, "67-56-1", "71-36-3", "78-92-2", "78-83-1", "75-65-0"}  # water, methanol, butanols
)


#: Solute volume [cm^3/mol] at which the aqueous Hayduk-Minhas factor V^-0.19 - 0.292 is zero.
_HM_AQUEOUS_V_MAX: Final = 0.292 ** (-1.0 / 0.19)
#: Largest solute volume [m^3/mol] at which the aqueous Hayduk-Minhas form is validated here:
#: the largest aqueous solute of the validation rows is ethylbenzene, 140 cm^3/mol, within 10 %
#: (Poling et al. 5th ed. ch. 11 example, from memory).  The range of the paper's own data set
#: could not be checked (the paper was not at hand).  Beyond it the form runs low for large
#: polyhydroxy solutes: sucrose (325 cm^3/mol, Le Bas) comes out 3.38e-10 m^2/s against a
#: measured 5.2e-10 (Cussler 3rd ed. Table 5.2-1, from memory), 35 % low.
HM_AQUEOUS_VALIDATED_V_MAX: Final = 150e-6


def _describe(v: FloatOrArray) -> str:
    return f"{v:g}" if isinstance(v, float) else f"array with maximum {float(np.max(v)):g}"


def _cp(mu: FloatOrArray) -> FloatOrArray:
    return mu * 1000.0


def _warn_viscous(mu: FloatOrArray, method: str) -> None:
    high = mu > VISCOUS_SOLVENT_LIMIT if isinstance(mu, float) else bool(np.any(mu > VISCOUS_SOLVENT_LIMIT))
    if high:
        warn_caller(
            f"{method}: solvent viscosity above {VISCOUS_SOLVENT_LIMIT * 1e3:g} mPa s lies "
            "outside the range the correlation was fitted on (not for viscous solvents): a small "
            "solute's diffusivity falls more slowly than 1/viscosity there, and measured values "
            "for oxygen in 1,2-propanediol (Nogami & Kato 1962) and water in glycerol (D'Errico "
            "et al. 2004) are 4.5-9 times these estimates; use a measured value",
            EnvelopeWarning,
        )


def _check_volume(name: str, V: FloatOrArray) -> None:
    big = V > 0.01 if isinstance(V, float) else bool(np.any(V > 0.01))
    if big:
        raise InputValueError(
            f"{name} has a value above 0.01 m^3/mol, implausible for a molar volume; molar "
            "volumes are in m^3/mol (divide cm^3/mol by 1e6)"
        )


@guard
def wilke_chang(
    T: ArrayLike,
    mu_solvent: ArrayLike,
    M_solvent: float,
    V_solute: float,
    phi: float = 1.0,
) -> FloatOrArray:
    r"""Infinite-dilution liquid diffusivity by the Wilke-Chang correlation.

    .. math::

        D_{AB}^\circ = \frac{7.4\times10^{-8}\,(\phi M_B)^{1/2}\,T}
        {\eta_B\,V_A^{0.6}}

    (cm^2/s, g/mol, cP, cm^3/mol in the source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    mu_solvent : float or array_like
        Solvent viscosity at T [Pa s].
    M_solvent : float
        Solvent molar mass [kg/mol].
    V_solute : float
        Solute molar volume at its normal boiling point [m^3/mol].
    phi : float
        Association factor of the solvent [-]: 2.6 water, 1.9 methanol,
        1.5 ethanol, 1.0 unassociated solvents.

    Returns
    -------
    float or numpy.ndarray
        Diffusivity of the solute [m^2/s].

    Notes
    -----
    Average absolute error about 10-15 % over 250 systems (Poling et al.
    2001, Table 11-5); larger for viscous solvents and for water as solute.

    References
    ----------
    Wilke, C. R., & Chang, P. (1955). Correlation of diffusion coefficients
    in dilute solutions. *AIChE J.* 1, 264-270.
    https://doi.org/10.1002/aic.690010222

    Examples
    --------
    Ethylbenzene (V_A = 140 cm^3/mol) in water at 293 K (1.0 cP):

    >>> round(wilke_chang(293.0, 1.0e-3, 0.018015, 140e-6, phi=2.6) * 1e9, 3)
    0.765

    """
    Tv = check_positive("T", T)
    mu = check_positive("mu_solvent", mu_solvent)
    check_shapes(T=Tv, mu_solvent=mu)
    M = check_positive("M_solvent", M_solvent)
    V = check_positive("V_solute", V_solute)
    f = check_positive("phi", phi)
    _check_volume("V_solute", V)
    _warn_viscous(mu, "wilke_chang")
    D_cgs = 7.4e-8 * (f * M * 1000.0) ** 0.5 * Tv / (_cp(mu) * (V * 1e6) ** 0.6)
    return finish(D_cgs * 1e-4)


@guard
def hayduk_minhas_aqueous(T: ArrayLike, mu_water: ArrayLike, V_solute: float) -> FloatOrArray:
    r"""Infinite-dilution diffusivity in water by Hayduk and Minhas.

    .. math::

        D_{AW}^\circ = 1.25\times10^{-8}\,(V_A^{-0.19} - 0.292)\,T^{1.52}\,
        \eta_W^{\varepsilon^*}, \qquad \varepsilon^* = 9.58/V_A - 1.12

    (cm^2/s, cm^3/mol, cP in the source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    mu_water : float or array_like
        Viscosity of water at T [Pa s].
    V_solute : float
        Solute molar volume at its normal boiling point [m^3/mol].

    Returns
    -------
    float or numpy.ndarray
        Diffusivity [m^2/s].

    Notes
    -----
    Average absolute error about 10 % for aqueous solutions (Poling et al.
    2001, Section 11-9).  Domain: :math:`V_A` below about 650 cm^3/mol, where
    :math:`V_A^{-0.19} - 0.292` is positive; larger values raise an error.

    References
    ----------
    Hayduk, W., & Minhas, B. S. (1982). Correlations for prediction of
    molecular diffusivities in liquids. *Can. J. Chem. Eng.* 60, 295-299.
    https://doi.org/10.1002/cjce.5450600213

    Examples
    --------
    >>> round(hayduk_minhas_aqueous(293.0, 1.0e-3, 140e-6) * 1e9, 3)
    0.696

    """
    Tv = check_positive("T", T)
    mu = check_positive("mu_water", mu_water)
    check_shapes(T=Tv, mu_water=mu)
    V = check_positive("V_solute", V_solute)
    _check_volume("V_solute", V)
    Va = V * 1e6
    big = Va >= _HM_AQUEOUS_V_MAX if isinstance(Va, float) else bool(np.any(Va >= _HM_AQUEOUS_V_MAX))
    if big:
        raise InputValueError(
            f"V_solute={_describe(V)} m^3/mol lies outside the domain of the aqueous Hayduk-Minhas "
            f"equation: its factor V_A^-0.19 - 0.292 changes sign at V_A = {_HM_AQUEOUS_V_MAX:.0f} "
            "cm^3/mol; for larger solutes use stokes_einstein"
        )
    eps = 9.58 / Va - 1.12
    D_cgs = 1.25e-8 * (Va**-0.19 - 0.292) * Tv**1.52 * _cp(mu) ** eps
    return finish(D_cgs * 1e-4)


@guard
def hayduk_minhas_paraffin(T: ArrayLike, mu_solvent: ArrayLike, V_solute: float) -> FloatOrArray:
    r"""Infinite-dilution diffusivity in normal paraffins by Hayduk and Minhas.

    .. math::

        D_{AB}^\circ = 13.3\times10^{-8}\,T^{1.47}\,\eta_B^{\varepsilon}\,V_A^{-0.71},
        \qquad \varepsilon = 10.2/V_A - 0.791

    (cm^2/s, cP, cm^3/mol in the source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    mu_solvent : float or array_like
        Viscosity of the n-paraffin solvent at T [Pa s].
    V_solute : float
        Solute molar volume at its normal boiling point [m^3/mol].

    Returns
    -------
    float or numpy.ndarray
        Diffusivity [m^2/s].

    Notes
    -----
    Fitted on solutes in n-alkanes C5 to C32; about 5-10 % (Poling et al.
    2001, Section 11-9).

    References
    ----------
    Hayduk, W., & Minhas, B. S. (1982). *Can. J. Chem. Eng.* 60, 295-299.
    https://doi.org/10.1002/cjce.5450600213

    Examples
    --------
    >>> round(hayduk_minhas_paraffin(298.0, 0.3e-3, 96e-6) * 1e9, 2)
    5.15

    """
    Tv = check_positive("T", T)
    mu = check_positive("mu_solvent", mu_solvent)
    check_shapes(T=Tv, mu_solvent=mu)
    V = check_positive("V_solute", V_solute)
    _check_volume("V_solute", V)
    _warn_viscous(mu, "hayduk_minhas_paraffin")
    Va = V * 1e6
    eps = 10.2 / Va - 0.791
    D_cgs = 13.3e-8 * Tv**1.47 * _cp(mu) ** eps / Va**0.71
    return finish(D_cgs * 1e-4)


@guard
def hayduk_minhas(
    T: ArrayLike,
    mu_solvent: ArrayLike,
    V_solvent: ArrayLike,
    parachor_solute: float,
    parachor_solvent: ArrayLike,
) -> FloatOrArray:
    r"""Infinite-dilution diffusivity in non-aqueous solvents by Hayduk and Minhas.

    .. math::

        D_{AB}^\circ = 1.55\times10^{-8}\,T^{1.29}\,
        \frac{\mathcal{P}_B^{0.5}\,\mathcal{P}_A^{-0.42}}{\eta_B^{0.92}\,V_B^{0.23}}

    (cm^2/s, cP, cm^3/mol, parachors in cm^3 g^0.25 s^-0.5 mol^-1 in the
    source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    mu_solvent : float or array_like
        Solvent viscosity at T [Pa s].
    V_solvent : float or array_like
        Solvent molar volume at its normal boiling point [m^3/mol].
    parachor_solute : float
        Solute parachor [N^0.25 m^2.75/mol].
    parachor_solvent : float or array_like
        Solvent parachor [N^0.25 m^2.75/mol].

    Returns
    -------
    float or numpy.ndarray
        Diffusivity [m^2/s].

    Notes
    -----
    The special cases of :func:`liquid_diffusivity` (dimers, alcohol
    solvents) apply.  About 10 % for non-aqueous non-electrolyte solutions
    (Poling et al. 2001, Section 11-9).

    References
    ----------
    Hayduk, W., & Minhas, B. S. (1982). *Can. J. Chem. Eng.* 60, 295-299.
    https://doi.org/10.1002/cjce.5450600213

    Examples
    --------
    >>> round(hayduk_minhas(298.0, 0.6e-3, 96e-6, 161.6 / 5.623413e6,
    ...                     206.0 / 5.623413e6) * 1e9, 2)
    2.29

    """
    Tv = check_positive("T", T)
    mu = check_positive("mu_solvent", mu_solvent)
    check_shapes(T=Tv, mu_solvent=mu)
    Vb = check_positive("V_solvent", V_solvent)
    Pa = check_positive("parachor_solute", parachor_solute)
    Pb = check_positive("parachor_solvent", parachor_solvent)
    check_shapes(T=Tv, mu_solvent=mu, V_solvent=Vb, parachor_solvent=Pb)
    _check_volume("V_solvent", Vb)
    _warn_viscous(mu, "hayduk_minhas")
    D_cgs = (
        1.55e-8
        * Tv**1.29
        * (Pb * _PARACHOR_CGS) ** 0.5
        * (Pa * _PARACHOR_CGS) ** -0.42
        / (_cp(mu) ** 0.92 * (Vb * 1e6) ** 0.23)
    )
    return finish(D_cgs * 1e-4)


@guard
def tyn_calus(
    T: ArrayLike,
    mu_solvent: ArrayLike,
    V_solute: float,
    V_solvent: ArrayLike,
    parachor_solute: float,
    parachor_solvent: ArrayLike,
) -> FloatOrArray:
    r"""Infinite-dilution liquid diffusivity by the Tyn-Calus correlation.

    .. math::

        D_{AB}^\circ = 8.93\times10^{-8}\,\left(\frac{V_A}{V_B^2}\right)^{1/6}
        \left(\frac{\mathcal{P}_B}{\mathcal{P}_A}\right)^{0.6}\frac{T}{\eta_B}

    (cm^2/s, cm^3/mol, cP in the source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    mu_solvent : float or array_like
        Solvent viscosity at T [Pa s].
    V_solute : float
        Solute molar volume at its normal boiling point [m^3/mol].
    V_solvent : float or array_like
        Solvent molar volume at its normal boiling point [m^3/mol].
    parachor_solute : float
        Solute parachor [N^0.25 m^2.75/mol].
    parachor_solvent : float or array_like
        Solvent parachor [N^0.25 m^2.75/mol].

    Returns
    -------
    float or numpy.ndarray
        Diffusivity [m^2/s].

    Notes
    -----
    About 10 % average error (Poling et al. 2001, Table 11-5), subject to
    the special cases listed on :func:`liquid_diffusivity`.

    References
    ----------
    Tyn, M. T., & Calus, W. F. (1975). Diffusion coefficients in dilute
    binary liquid mixtures. *J. Chem. Eng. Data* 20, 106-109.
    https://doi.org/10.1021/je60064a006

    Examples
    --------
    >>> round(tyn_calus(298.0, 0.6e-3, 74e-6, 96e-6, 161.6 / 5.623413e6,
    ...                 206.0 / 5.623413e6) * 1e9, 2)
    2.3

    """
    Tv = check_positive("T", T)
    mu = check_positive("mu_solvent", mu_solvent)
    check_shapes(T=Tv, mu_solvent=mu)
    Va = check_positive("V_solute", V_solute)
    Vb = check_positive("V_solvent", V_solvent)
    Pa = check_positive("parachor_solute", parachor_solute)
    Pb = check_positive("parachor_solvent", parachor_solvent)
    check_shapes(T=Tv, mu_solvent=mu, V_solvent=Vb, parachor_solvent=Pb)
    _check_volume("V_solute", Va)
    _check_volume("V_solvent", Vb)
    _warn_viscous(mu, "tyn_calus")
    D_cgs = 8.93e-8 * ((Va * 1e6) / (Vb * 1e6) ** 2) ** (1.0 / 6.0) * (Pb / Pa) ** 0.6 * Tv / _cp(mu)
    return finish(D_cgs * 1e-4)


@guard
def stokes_einstein(
    T: ArrayLike, mu_solvent: ArrayLike, radius: ArrayLike, boundary: str = "stick"
) -> FloatOrArray:
    r"""Diffusivity of a large sphere or particle by the Stokes-Einstein equation.

    .. math:: D = \frac{k_B T}{c\,\pi\,\eta\,r}, \qquad c = 6
        \text{ (stick) or } 4 \text{ (slip)}

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    mu_solvent : float or array_like
        Solvent viscosity at T [Pa s].
    radius : float or array_like
        Hydrodynamic radius of the solute or particle [m].
    boundary : {'stick', 'slip'}
        Hydrodynamic boundary condition at the sphere's surface.

    Returns
    -------
    float or numpy.ndarray
        Diffusivity [m^2/s].

    Notes
    -----
    Exact for a rigid sphere much larger than the solvent molecules
    (colloids, proteins, particles above about 1 nm); it under-predicts
    small-molecule diffusivities, often by a factor of two or more.

    References
    ----------
    Einstein, A. (1905). *Ann. Phys.* 17, 549-560.
    https://doi.org/10.1002/andp.19053220806

    Examples
    --------
    A 100 nm (radius) particle in water at 298.15 K:

    >>> round(stokes_einstein(298.15, 0.89e-3, 100e-9) * 1e12, 3)
    2.454

    """
    Tv = check_positive("T", T)
    mu = check_positive("mu_solvent", mu_solvent)
    r = check_positive("radius", radius)
    check_shapes(T=Tv, mu_solvent=mu, radius=r)
    c = {"stick": 6.0, "slip": 4.0}.get(boundary)
    if c is None:
        raise InputValueError(f"boundary={boundary!r} is not 'stick' or 'slip'; choose one")
    return finish(BOLTZMANN * Tv / (c * math.pi * mu * r))


#: Temperature of the tabulated limiting ionic diffusivities [K].
ION_TABLE_T: Final = 298.15
#: Viscosity of water at 25 C [Pa s]: 0.8900 mPa s (IAPWS 2008 formulation, from memory).
WATER_VISCOSITY_25C: Final = 0.8900e-3


@guard
def nernst_haskell(
    T: ArrayLike,
    mu_water: ArrayLike,
    D_cation: float,
    D_anion: float,
    z_cation: float = 1.0,
    z_anion: float = 1.0,
    mu_ref: float = WATER_VISCOSITY_25C,
) -> FloatOrArray:
    r"""Infinite-dilution diffusivity of a strong electrolyte in water (Nernst-Haskell).

    .. math::

        D^\circ_{salt}(T) = \frac{(|z_+| + |z_-|)\,D_+ D_-}{|z_+|\,D_+ + |z_-|\,D_-}
        \cdot \frac{T}{T_{ref}}\,\frac{\eta_{ref}}{\eta_W(T)}

    with :math:`D_\pm` the limiting ionic diffusivities at :math:`T_{ref}` = 298.15 K.  The
    salt diffuses as a neutral pair: the faster ion is held back by the slower one's charge.
    The factor :math:`T\eta_{ref}/(T_{ref}\eta_W)` carries the 25 C value to T by
    Stokes-Einstein scaling (an approximation, see Notes).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    mu_water : float or array_like
        Viscosity of water at T [Pa s].
    D_cation : float
        Limiting diffusivity of the cation in water at 298.15 K [m^2/s].
    D_anion : float
        Limiting diffusivity of the anion in water at 298.15 K [m^2/s].
    z_cation : float
        Magnitude of the cation's charge number [-] (1 for Na+, 2 for Ca2+).
    z_anion : float
        Magnitude of the anion's charge number [-] (1 for Cl-, 2 for SO4 2-).
    mu_ref : float
        Viscosity of water at 298.15 K [Pa s], the reference of the scaling (0.8900 mPa s).

    Returns
    -------
    float or numpy.ndarray
        Diffusivity of the salt at infinite dilution [m^2/s].

    Notes
    -----
    Exact at infinite dilution, where the ions move independently apart from their
    electroneutral coupling (Nernst 1888; Haskell 1908): from the CRC Handbook's limiting ionic
    diffusivities it reproduces measured limiting salt diffusivities at 25 C within about
    1 % (NaCl 1.61e-9, KCl 1.99e-9, HCl 3.34e-9 m^2/s; Robinson & Stokes 1959, from memory).
    Away from 25 C the Stokes-Einstein scaling (Walden's rule) is an approximation of a few
    per cent for ordinary ions, poorer for H+ and OH-, whose proton-hopping mobility follows
    viscosity less closely (from memory).  At finite concentration the diffusivity of a salt
    differs from this limit, by up to some tens of per cent at 1 mol/L; use measured data
    there and wherever the result matters.

    References
    ----------
    Nernst, W. (1888). Zur Kinetik der in Lösung befindlichen Körper. *Z. Phys. Chem.* 2,
    613-637 (from memory).

    Haskell, R. (1908). The diffusion of electrolytes. *Phys. Rev.* 27, 145-182 (from
    memory).

    Vanýsek, P. Ionic conductivity and diffusion at infinite dilution. *CRC Handbook of
    Chemistry and Physics*, 86th ed. (2005), Section 5.

    Examples
    --------
    Sodium chloride at 25 C, from D(Na+) = 1.334e-9 and D(Cl-) = 2.032e-9 m^2/s:

    >>> round(nernst_haskell(298.15, 0.89e-3, 1.334e-9, 2.032e-9) * 1e9, 3)
    1.611

    """
    Tv = check_positive("T", T)
    mu = check_positive("mu_water", mu_water)
    check_shapes(T=Tv, mu_water=mu)
    Dp = check_positive("D_cation", D_cation)
    Dm = check_positive("D_anion", D_anion)
    zp = check_positive("z_cation", z_cation, "pass the magnitude of the charge number, e.g. 2 for Ca2+")
    zm = check_positive("z_anion", z_anion, "pass the magnitude of the charge number, e.g. 2 for SO4 2-")
    check_shapes(D_cation=Dp, D_anion=Dm, z_cation=zp, z_anion=zm)
    mu0 = check_positive("mu_ref", mu_ref)
    D25 = (zp + zm) * Dp * Dm / (zp * Dp + zm * Dm)
    return finish(D25 * (Tv / ION_TABLE_T) * (mu0 / mu))


# --------------------------------------------------------------------------
# names in: constant preparation per method, the records, the dispatcher
# --------------------------------------------------------------------------


@dataclass(frozen=True, eq=False)
class LiquidDiffusivityInputs(FrozenResult):
    """The constants :func:`liquid_diffusivity` used, after special cases.

    Attributes
    ----------
    V_solute : float
        Solute molar volume at its normal boiling point [m^3/mol], as used.
    V_solvent : float or None
        Solvent molar volume at its normal boiling point [m^3/mol].
    parachor_solute : float or None
        Solute parachor [N^0.25 m^2.75/mol], as used.
    parachor_solvent : float or None
        Solvent parachor [N^0.25 m^2.75/mol].
    phi : float
        Wilke-Chang association factor [-].
    form : str
        Which form of the method was used.
    notes : tuple of str
        The special-case rules that were applied, with the values they changed.

    """

    V_solute: float
    V_solvent: float | None
    parachor_solute: float | None
    parachor_solvent: float | None
    phi: float
    form: str
    notes: tuple[str, ...]


def _used(sp: Species, name: str, value: float | None = None, source: str | None = None) -> ConstantUsed:
    v = getattr(sp, name) if value is None else value
    if v is None:
        return ConstantUsed(None, "absent")
    origin = sp.origins.get(name)
    src = source or sp.sources.get(name) or (origin.value if origin is not None else "user")
    return ConstantUsed(float(v), src)


def _solute_volume(a: Species, method: str) -> tuple[float, tuple[str, ...], str]:
    """Solute V_b: the tabulated value for small molecules, else the species' own (noted)."""
    tab = data.SMALL_MOLECULE_VB.get(a.CAS or "")
    if tab is not None and a.origins.get("Vb") is not Origin.USER:
        if a.Vb is None or abs(a.Vb - tab) > 0.01 * tab:
            was = "none" if a.Vb is None else f"{a.Vb * 1e6:.1f}"
            note = (
                f"{a.name}: tabulated molar volume at the boiling point {tab * 1e6:.1f} cm^3/mol used "
                f"(the value the correlations were fitted with) instead of {was} cm^3/mol"
            )
            return tab, (note,), "Treybal 3rd ed. Table 2.3 (from memory)"
        return tab, (), "Treybal 3rd ed. Table 2.3 (from memory)"
    return a.require("Vb", method), (), _used(a, "Vb").source


def _volume_cautions(a: Species, Va: float, src: str) -> tuple[str, ...]:
    """Return a caution when V_b came from a liquid model at a boiling point nobody measured."""
    if src != "thermo VolumeLiquid at Tb" or boiling_point_measured(a) is not False:
        return ()
    try:
        le_bas = f"; its Le Bas volume is {le_bas_volume(dict(a.atoms), a.smiles) * 1e6:.0f} cm^3/mol"
    except (MissingConstantError, InputValueError):
        le_bas = ""
    return (
        f"the solute's molar volume at its boiling point, {Va * 1e6:.0f} cm^3/mol, was "
        f"extrapolated by thermo's liquid-volume model to a boiling point of {a.Tb:.0f} K that no "
        "evaluated table measures (the substance may decompose before it boils, as urea does)"
        f"{le_bas}; the estimate can be tens of per cent off (urea in water: 28 % low by "
        "Hayduk-Minhas); supply a volume with masstransfer.species(...).replace(Vb=...) or use a "
        "measured diffusivity",
    )


def _prepare_wilke_chang(a: Species, b: Species) -> Prepared:
    Va, notes, src = _solute_volume(a, "Wilke-Chang")
    phi = data.WILKE_CHANG_ASSOCIATION.get(b.CAS or "", 1.0)
    factor = 1.0
    extra: list[str] = []
    if SpeciesClass.WATER in classify(a) and SpeciesClass.WATER not in classify(b):
        factor = 1.0 / 2.3
        extra.append(
            "water as solute: the Wilke-Chang value is divided by 2.3 (Olander 1961, as "
            "recommended in Reid, Prausnitz & Poling 1987, 4th ed., Section 11-9, from memory)"
        )
    cautions = _volume_cautions(a, Va, src)
    if SpeciesClass.ACID in classify(a) and SpeciesClass.WATER not in classify(b):
        cautions += (
            "a carboxylic acid dissolved in a non-aqueous solvent associates (dimerises), for which "
            "Wilke-Chang has no rule: acetic acid in ethyl acetate comes out 69 % high against "
            "Benitez, Appendix Table A.2; prefer method='tyn-calus' (its dimer rule) or measured data",
        )
    consts = {
        "solute": {"Vb (as used)": ConstantUsed(Va, src)},
        "medium": {
            "molar_mass": _used(b, "molar_mass"),
            "association factor": ConstantUsed(phi, "Wilke & Chang (1955), via Poling et al. Section 11-9"),
        },
    }
    return Prepared((b.molar_mass, Va, phi, factor), consts, (*notes, *extra), cautions, form="wilke-chang")


def _dimer_rules(a: Species, b: Species, Va: float, Pa: float) -> tuple[float, float, tuple[str, ...]]:
    ca, cb = classify(a), classify(b)
    if SpeciesClass.WATER in ca and SpeciesClass.WATER not in cb:
        why = "water as solute"
    elif SpeciesClass.ACID in ca and (b.CAS or "") not in _NON_DIMERISING_ACID_SOLVENTS:
        why = "organic acid solute"
    else:
        return Va, Pa, ()
    note = (
        f"{why}: treated as a dimer, V_A {Va * 1e6:.1f} -> {2 * Va * 1e6:.1f} cm^3/mol and parachor "
        f"{Pa * _PARACHOR_CGS:.1f} -> {2 * Pa * _PARACHOR_CGS:.1f} (Poling et al. 2001, Section 11-9, "
        "from memory)"
    )
    return 2 * Va, 2 * Pa, (note,)


def _alcohol_rule(a: Species, b: Species) -> tuple[bool, tuple[str, ...]]:
    """Non-polar solute in a monohydroxy alcohol: V_B and P_B scaled by 8 eta_B (cP)."""
    ca, cb = classify(a), classify(b)
    if SpeciesClass.ALCOHOL not in cb:
        return False, ()
    if SpeciesClass.DIPOLE_UNKNOWN in ca:
        return False, (
            f"{a.name}: dipole moment unknown, so the rule for a non-polar solute in an alcohol "
            "(V_B and solvent parachor times 8 eta_B) was not applied; supply the dipole to decide",
        )
    if SpeciesClass.NONPOLAR in ca:
        return True, (
            "non-polar solute in a monohydroxy alcohol: V_B and the solvent parachor multiplied by "
            "8 eta_B [cP] (Poling et al. 2001, Section 11-9, from memory)",
        )
    return False, ()


def _prepare_parachor_method(
    a: Species, b: Species, name: str
) -> tuple[tuple[float, ...], dict[str, dict[str, ConstantUsed]], tuple[str, ...], tuple[str, ...]]:
    from ..substances._properties import parachor

    Va, notes, src = _solute_volume(a, name)
    cautions = _volume_cautions(a, Va, src)
    Vb = b.require("Vb", name)
    Pa, Pb = parachor(a), parachor(b)
    Va2, Pa2, dimer = _dimer_rules(a, b, Va, Pa)
    alcohol, alc_notes = _alcohol_rule(a, b)
    consts = {
        "solute": {
            "Vb (as used)": ConstantUsed(Va2, src),
            "parachor (as used)": ConstantUsed(
                Pa2, _used(a, "parachor", Pa, "masstransfer.substances.parachor").source
            ),
        },
        "medium": {
            "Vb": _used(b, "Vb"),
            "parachor": _used(b, "parachor", Pb, "masstransfer.substances.parachor"),
        },
    }
    return (Va2, Vb, Pa2, Pb, 1.0 if alcohol else 0.0), consts, (*notes, *dimer, *alc_notes), cautions


def _prepare_tyn_calus(a: Species, b: Species) -> Prepared:
    args, consts, notes, cautions = _prepare_parachor_method(a, b, "Tyn-Calus")
    return Prepared(args, consts, notes, cautions, form="tyn-calus")


def _prepare_hayduk_minhas(a: Species, b: Species) -> Prepared:
    cb = classify(b)
    if SpeciesClass.WATER in cb or SpeciesClass.N_PARAFFIN in cb:
        Va, notes, src = _solute_volume(a, "Hayduk-Minhas")
        form = "aqueous" if SpeciesClass.WATER in cb else "n-paraffin"
        consts = {"solute": {"Vb (as used)": ConstantUsed(Va, src)}, "medium": {}}
        cautions = _volume_cautions(a, Va, src)
        if form == "aqueous" and Va > HM_AQUEOUS_VALIDATED_V_MAX:
            cautions += (
                f"the solute's molar volume, {Va * 1e6:.0f} cm^3/mol, lies above "
                f"{HM_AQUEOUS_VALIDATED_V_MAX * 1e6:.0f} cm^3/mol, beyond the solutes this library "
                "has checked the aqueous form on (the largest, ethylbenzene, 140 cm^3/mol); of larger "
                "ones, sucrose (325 cm^3/mol) comes out 35 % below the measured 5.2e-10 m^2/s (Cussler "
                "3rd ed. Table 5.2-1, from memory); compare with a measured value",
            )
        return Prepared(
            (Va,),
            consts,
            (*notes, f"Hayduk-Minhas {form} form (solvent is {b.name})"),
            cautions,
            form=form,
        )
    args, consts, notes, cautions = _prepare_parachor_method(a, b, "Hayduk-Minhas")
    return Prepared(
        args, consts, (*notes, "Hayduk-Minhas general (non-aqueous) form"), cautions, form="general"
    )


def _prepare_stokes_einstein(a: Species, b: Species) -> Prepared:
    Va, notes, src = _solute_volume(a, "Stokes-Einstein")
    r = (3.0 * Va / (4.0 * math.pi * AVOGADRO)) ** (1.0 / 3.0)
    cautions = _volume_cautions(a, Va, src)
    if r < 1e-9:
        cautions += (
            f"Stokes-Einstein: the solute's radius ({r * 1e9:.2f} nm, from V_b) is below about 1 nm; "
            "the equation is for spheres much larger than the solvent molecules and under-predicts "
            "small molecules, often by a factor of two",
        )
    consts = {
        "solute": {
            "Vb (as used)": ConstantUsed(Va, src),
            "radius": ConstantUsed(r, "sphere of volume V_b / N_A"),
        },
        "medium": {},
    }
    return Prepared((r,), consts, notes, cautions, form="stokes-einstein")


def _alcohol_scaled(args: tuple[float, ...], mu: FloatOrArray) -> tuple[FloatOrArray, FloatOrArray]:
    _, Vb, _, Pb, alcohol = args
    if not alcohol:
        return Vb, Pb
    factor = 8.0 * np.asarray(mu) * 1000.0
    return finish(Vb * factor), finish(Pb * factor)


def _evaluate_wilke_chang(prep: Prepared, T: FloatOrArray, mu: FloatOrArray) -> FloatOrArray:
    M, Va, phi, factor = prep.args
    return finish(wilke_chang(T, mu, M, Va, phi) * factor)


def _evaluate_tyn_calus(prep: Prepared, T: FloatOrArray, mu: FloatOrArray) -> FloatOrArray:
    Vb, Pb = _alcohol_scaled(prep.args, mu)
    return tyn_calus(T, mu, prep.args[0], Vb, prep.args[2], Pb)


def _evaluate_hayduk_minhas(prep: Prepared, T: FloatOrArray, mu: FloatOrArray) -> FloatOrArray:
    if prep.form == "aqueous":
        return hayduk_minhas_aqueous(T, mu, prep.args[0])
    if prep.form == "n-paraffin":
        return hayduk_minhas_paraffin(T, mu, prep.args[0])
    Vb, Pb = _alcohol_scaled(prep.args, mu)
    return hayduk_minhas(T, mu, Vb, prep.args[2], Pb)


def _evaluate_stokes_einstein(prep: Prepared, T: FloatOrArray, mu: FloatOrArray) -> FloatOrArray:
    return stokes_einstein(T, mu, prep.args[0])


_ION_SOURCE = (
    "Vanysek, CRC Handbook of Chemistry and Physics 86th ed., Section 5 "
    "(masstransfer._tables.LIMITING_ION_DIFFUSIVITY)"
)
#: Issued with every electrolyte diffusivity.
_DILUTION_CAUTION = (
    "the value is the infinite-dilution limit; the diffusivity of a salt at finite concentration "
    "differs from it, by up to some tens of per cent at 1 mol/L, and the estimate is no substitute "
    "for measured data where the result matters"
)


def _no_electrolyte_data(a: Species, why: str) -> MissingConstantError:
    return MissingConstantError(
        f"{a.name!r} is a strong electrolyte and {why}, so no estimate is made (the molecular "
        "correlations do not apply to ions); use a measured diffusivity, given as D= to the "
        "calculation that needs it"
    )


def _prepare_nernst_haskell(a: Species, b: Species) -> Prepared:
    if ionic_kind(a) != "electrolyte":
        raise MissingConstantError(
            f"method='nernst-haskell' is for strong electrolytes (salts, strong acids and strong "
            f"bases) in water, and {a.name!r} is not one; use a molecular method (method=None "
            "picks the recommended one)"
        )
    if (b.CAS or "") != _WATER:
        raise _no_electrolyte_data(
            a, f"the library holds limiting ionic diffusivities in water only, none in {b.name!r}"
        )
    salt = salt_ions(a)
    if salt is None:
        known = ", ".join(data.LIMITING_ION_DIFFUSIVITY)
        raise _no_electrolyte_data(a, f"its formula {a.formula} is not made of the tabulated ions ({known})")
    from ..substances._properties import liquid_model

    mu_ref = float(liquid_model(b).viscosity(ION_TABLE_T))
    consts = {
        "solute": {
            f"D of {salt.cation} at 298.15 K": ConstantUsed(salt.D_cation, _ION_SOURCE),
            f"D of {salt.anion} at 298.15 K": ConstantUsed(salt.D_anion, _ION_SOURCE),
            "cation charge number": ConstantUsed(float(salt.z_cation), _ION_SOURCE),
            "anion charge number (magnitude)": ConstantUsed(float(salt.z_anion), _ION_SOURCE),
        },
        "medium": {
            "viscosity at 298.15 K (scaling reference)": ConstantUsed(
                mu_ref, "masstransfer.liquid_model (thermo)"
            )
        },
    }
    D25 = nernst_haskell(
        ION_TABLE_T, mu_ref, salt.D_cation, salt.D_anion, salt.z_cation, salt.z_anion, mu_ref
    )
    note = (
        f"{a.name} taken as fully dissociated into {salt.cation} and {salt.anion}: Nernst-Haskell "
        f"limit {D25:.4g} m^2/s at 298.15 K, carried to T by T/viscosity (Stokes-Einstein scaling)"
    )
    return Prepared(
        (salt.D_cation, salt.D_anion, float(salt.z_cation), float(salt.z_anion), mu_ref),
        consts,
        (note,),
        (_DILUTION_CAUTION,),
        form="nernst-haskell",
    )


def _evaluate_nernst_haskell(prep: Prepared, T: FloatOrArray, mu: FloatOrArray) -> FloatOrArray:
    return nernst_haskell(T, mu, *prep.args)


#: The molecular correlations do not describe a solute that dissociates into ions.
_MOLECULAR_ONLY: Final = (
    ClassRule(
        SpeciesClass.ELECTROLYTE,
        Role.SOLUTE,
        "the solute is a strong electrolyte: in water it diffuses as ions held together by their "
        "charges, which this molecular correlation does not describe (sodium hydroxide in water "
        "comes out about 40 % low by Hayduk-Minhas); use method='nernst-haskell'",
    ),
    ClassRule(
        SpeciesClass.ION,
        Role.SOLUTE,
        "the solute is a single ion, whose diffusion is coupled to that of its counter-ions; "
        "name the salt, acid or base and use method='nernst-haskell'",
    ),
)


_LIQUID_T: Final = (263.0, 373.0)

#: The liquid-phase methods, in the order they are tried when the default does not apply.
LIQUID_METHODS: Final[Mapping[str, DiffusivityMethod]] = MappingProxyType(
    {
        r.name: r
        for r in (
            DiffusivityMethod(
                name="wilke-chang",
                phase="liquid",
                title="Wilke & Chang (1955)",
                function=wilke_chang,
                constants=("Vb", "molar_mass"),
                accuracy_pct=13.0,
                accuracy="about 10-15 % average absolute error on some 250 systems; larger for "
                "water as solute and viscous solvents (Poling et al. 2001, Section 11-9, from memory)",
                reference="Wilke & Chang (1955), AIChE J. 1, 264; https://doi.org/10.1002/aic.690010222",
                scope="dilute non-electrolyte solutes in water and organic solvents below about 20 mPa s",
                T_range=_LIQUID_T,
                P_max=None,
                prepare=_prepare_wilke_chang,
                excludes=_MOLECULAR_ONLY,
                evaluate=_evaluate_wilke_chang,
            ),
            DiffusivityMethod(
                name="hayduk-minhas",
                phase="liquid",
                title="Hayduk & Minhas (1982): aqueous, n-paraffin and general forms",
                function=hayduk_minhas,
                constants=("Vb", "parachor"),
                accuracy_pct=10.0,
                accuracy="about 10 % average absolute error, 5-10 % in n-paraffins (Poling et al. "
                "2001, Section 11-9, from memory)",
                reference="Hayduk & Minhas (1982), Can. J. Chem. Eng. 60, 295; "
                "https://doi.org/10.1002/cjce.5450600213",
                scope="water (aqueous form), n-alkanes C5-C32 (paraffin form), other non-aqueous "
                "solvents (general form, needs parachors)",
                T_range=_LIQUID_T,
                P_max=None,
                prepare=_prepare_hayduk_minhas,
                excludes=_MOLECULAR_ONLY,
                evaluate=_evaluate_hayduk_minhas,
            ),
            DiffusivityMethod(
                name="tyn-calus",
                phase="liquid",
                title="Tyn & Calus (1975)",
                function=tyn_calus,
                constants=("Vb", "parachor"),
                accuracy_pct=10.0,
                accuracy="about 10 % average absolute error, with the water, acid and alcohol rules "
                "(Poling et al. 2001, Section 11-9, from memory)",
                reference="Tyn & Calus (1975), J. Chem. Eng. Data 20, 106; https://doi.org/10.1021/je60064a006",
                scope="solutes in organic solvents below about 20 mPa s; needs both parachors",
                T_range=_LIQUID_T,
                P_max=None,
                prepare=_prepare_tyn_calus,
                excludes=_MOLECULAR_ONLY,
                evaluate=_evaluate_tyn_calus,
            ),
            DiffusivityMethod(
                name="stokes-einstein",
                phase="liquid",
                title="Stokes-Einstein",
                function=stokes_einstein,
                constants=("Vb",),
                accuracy_pct=20.0,
                accuracy="for spheres much larger than the solvent molecules (particles, "
                "macromolecules); under-predicts small molecules, often by a factor of two "
                "(Poling et al. 2001, Section 11-9, from memory)",
                reference="Einstein (1905), Ann. Phys. 17, 549; https://doi.org/10.1002/andp.19053220806",
                scope="large spherical solutes and particles (radius above about 1 nm)",
                T_range=_LIQUID_T,
                P_max=None,
                prepare=_prepare_stokes_einstein,
                excludes=_MOLECULAR_ONLY,
                evaluate=_evaluate_stokes_einstein,
            ),
            DiffusivityMethod(
                name="nernst-haskell",
                phase="liquid",
                title="Nernst (1888) and Haskell (1908): strong electrolytes in water",
                function=nernst_haskell,
                constants=("formula", "smiles"),
                accuracy_pct=5.0,
                accuracy="within about 1 % of measured limiting salt diffusivities at 25 C (NaCl, "
                "KCl, HCl; Robinson & Stokes 1959, from memory); a few per cent more away from 25 C "
                "from the T/viscosity scaling; at finite concentration the value differs by up to "
                "some tens of per cent at 1 mol/L",
                reference="Nernst (1888), Z. Phys. Chem. 2, 613; ionic diffusivities: Vanysek, CRC "
                "Handbook of Chemistry and Physics 86th ed., Section 5",
                scope="strong electrolytes (alkali, alkaline-earth and ammonium salts, strong mineral "
                "acids, strong bases) at infinite dilution in water",
                T_range=(273.15, 373.15),
                P_max=None,
                prepare=_prepare_nernst_haskell,
                evaluate=_evaluate_nernst_haskell,
            ),
        )
    }
)


@guard(check_output=False)
def liquid_default(solvent: str | Species) -> str:
    """Return the default liquid method for a solvent, by published recommendation.

    Parameters
    ----------
    solvent : str or Species
        The solvent [-] (name, CAS number, formula or :class:`~masstransfer.Species`).

    Returns
    -------
    str
        The name of the default method's record in :data:`LIQUID_METHODS`.

    Notes
    -----
    Water: Hayduk-Minhas's aqueous form; n-paraffins: its paraffin form; other organic
    solvents: Tyn-Calus (Poling, Prausnitz & O'Connell 2001, Section 11-10 recommendations,
    from memory).  For a strong electrolyte in water the dispatcher uses ``'nernst-haskell'``
    instead (the solute decides that, not the solvent).  When the default's constants are
    missing (a parachor), the dispatcher uses the next record that applies and notes the choice.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The Properties of Gases and
    Liquids*, 5th ed., Section 11-10.

    Examples
    --------
    >>> liquid_default("water"), liquid_default("n-heptane"), liquid_default("ethanol")
    ('hayduk-minhas', 'hayduk-minhas', 'tyn-calus')

    """
    solvent = species(solvent)
    cls = classify(solvent)
    if SpeciesClass.WATER in cls or SpeciesClass.N_PARAFFIN in cls:
        return "hayduk-minhas"
    return "tyn-calus"


def _electrolyte_default(a: Species, b: Species) -> str | None:
    """'nernst-haskell' for a strong electrolyte in water; refuse single ions and other solvents."""
    kind = ionic_kind(a)
    if kind is None:
        return None
    if kind == "ion":
        raise InputValueError(
            f"solute={a.name!r} is a single ion ({a.formula}): an ion does not diffuse on its own, "
            "its flux is coupled to that of its counter-ions, which keep the solution neutral; "
            "name the salt, acid or base it comes from (for example 'sodium sulfate' rather than "
            "'sulfate'), whose diffusivity in water follows from method='nernst-haskell'"
        )
    if (b.CAS or "") != _WATER:
        raise _no_electrolyte_data(
            a, f"the library holds limiting ionic diffusivities in water only, none in {b.name!r}"
        )
    if salt_ions(a) is None:  # one reason, not the same refusal repeated by every molecular method
        if dict(a.atoms) == {"N": 1, "H": 5, "O": 1}:
            raise InputValueError(
                f"solute={a.name!r} is ammonia dissolved in water, a weak base that stays mostly "
                "molecular; pass 'ammonia' as the solute"
            )
        known = ", ".join(data.LIMITING_ION_DIFFUSIVITY)
        raise _no_electrolyte_data(a, f"its formula {a.formula} is not made of the tabulated ions ({known})")
    return "nernst-haskell"


@dataclass(frozen=True, slots=True)
class _ReadyLiquid:
    record: DiffusivityMethod
    prepared: Prepared
    limits: PhaseLimits
    solute: str
    solvent: Species
    cautions: tuple[str, ...]
    notes: tuple[str, ...]
    ambiguous: tuple[str, ...] = ()  # ambiguity warnings, issued again on every cached call


_READY: dict[tuple[object, object, object], _ReadyLiquid] = {}


def ready_liquid(solute: str | Species, solvent: str | Species, method: str | None) -> _ReadyLiquid:
    """Return the cached preparation :func:`liquid_diffusivity` uses (for the report and the CLI)."""
    key = (method, solute, solvent)
    try:
        cached = _READY[key]
    except (KeyError, TypeError):
        pass
    else:
        if cached.ambiguous:
            rewarn_ambiguity(cached.ambiguous)
        return cached
    from ._gas import prepare_pair

    a, b = species(solute), species(solvent)
    if method is not None:
        normalise_method(method, LIQUID_METHODS, phase="liquid")
    default = _electrolyte_default(a, b) or liquid_default(b)
    rec, prep, cautions, notes = prepare_pair(LIQUID_METHODS, default, method, a, b)
    r = _ReadyLiquid(
        record=rec,
        prepared=prep,
        limits=phase_limits(b),
        solute=a.name,
        solvent=b,
        cautions=tuple(f"{rec.name} for {a.name} in {b.name}: {c}" for c in cautions),
        notes=(*notes, *prep.notes),
        ambiguous=ambiguity_warnings(solute, solvent),
    )
    if len(_READY) > 4096:
        _READY.clear()
    _READY[key] = r
    return r


@guard
def liquid_diffusivity_inputs(
    solute: str | Species, solvent: str | Species, method: str | None = None
) -> LiquidDiffusivityInputs:
    """Resolve the constants a liquid method needs, applying the special cases.

    Parameters
    ----------
    solute : str or Species
        Diffusing species.
    solvent : str or Species
        Solvent.
    method : str, optional
        One of :data:`LIQUID_METHODS`; None for the solvent's default.

    Returns
    -------
    LiquidDiffusivityInputs
        The molar volumes, parachors and association factor used, and the
        rules applied (see :func:`masstransfer.liquid_diffusivity`).

    Notes
    -----
    Molar volumes come from ``thermo`` at the normal boiling point, tabulated values for small
    molecules, or Le Bas volumes; parachors from :func:`masstransfer.substances.parachor`.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Section 11-9.

    Examples
    --------
    >>> liquid_diffusivity_inputs("water", "ethanol", "tyn-calus").notes[0]  # doctest: +ELLIPSIS
    'water as solute: treated as a dimer, V_A 18.9 -> 37.8 cm^3/mol and parachor ...'

    """
    r = ready_liquid(solute, solvent, method)
    p = r.prepared
    if p.form == "nernst-haskell":
        raise InputValueError(
            f"method='nernst-haskell' for {r.solute!r} uses no molar volumes or parachors; the "
            "ionic diffusivities it used, with their sources, are in "
            "masstransfer.diffusivity_report(...).constants"
        )
    phi = data.WILKE_CHANG_ASSOCIATION.get(r.solvent.CAS or "", 1.0)
    if r.record.name == "wilke-chang":
        return LiquidDiffusivityInputs(p.args[1], None, None, None, phi, p.form, r.notes)
    if p.form in ("aqueous", "n-paraffin", "stokes-einstein"):
        V = p.constants["solute"]["Vb (as used)"].value
        assert V is not None
        return LiquidDiffusivityInputs(V, None, None, None, phi, p.form, r.notes)
    Va, Vb, Pa, Pb, _ = p.args
    return LiquidDiffusivityInputs(Va, Vb, Pa, Pb, phi, p.form, r.notes)


@overload
def liquid_diffusivity(
    solute: str | Species,
    solvent: str | Species,
    T: float,
    method: str | None = ...,
    *,
    P: float = ...,
    mu_solvent: float | None = ...,
    phi: float | None = ...,
    radius: float | None = ...,
) -> float: ...
@overload
def liquid_diffusivity(
    solute: str | Species,
    solvent: str | Species,
    T: FloatArray,
    method: str | None = ...,
    *,
    P: ArrayLike = ...,
    mu_solvent: ArrayLike | None = ...,
    phi: float | None = ...,
    radius: float | None = ...,
) -> FloatArray: ...
@overload
def liquid_diffusivity(
    solute: str | Species,
    solvent: str | Species,
    T: ArrayLike,
    method: str | None = ...,
    *,
    P: ArrayLike = ...,
    mu_solvent: ArrayLike | None = ...,
    phi: float | None = ...,
    radius: float | None = ...,
) -> FloatOrArray: ...
@guard
def liquid_diffusivity(
    solute: str | Species,
    solvent: str | Species,
    T: ArrayLike,
    method: str | None = None,
    *,
    P: ArrayLike = 101325.0,
    mu_solvent: ArrayLike | None = None,
    phi: float | None = None,
    radius: float | None = None,
) -> FloatOrArray:
    r"""Infinite-dilution diffusivity of ``solute`` in liquid ``solvent``.

    Parameters
    ----------
    solute : str or Species
        Diffusing species: name, CAS number, formula, or :class:`Species`.
    solvent : str or Species
        Solvent, e.g. ``"water"``.
    T : float or array_like
        Temperature [K]; the solvent must be liquid there.
    method : {None, 'wilke-chang', 'hayduk-minhas', 'tyn-calus', 'stokes-einstein', 'nernst-haskell'}
        Estimation method (see :data:`LIQUID_METHODS`); None picks the published
        recommendation for the solvent (:func:`liquid_default`), or ``'nernst-haskell'`` for a
        strong electrolyte in water.  ``'hayduk-minhas'`` uses the aqueous form for water, the
        n-paraffin form for normal alkane solvents and the general form otherwise.
    P : float or array_like
        Pressure [Pa], used only to check that the solvent is liquid (not boiling) at T.
        Keyword only: ``P=101325.0``.
    mu_solvent : float or array_like, optional
        Solvent viscosity [Pa s]; from :func:`masstransfer.liquid_model` when omitted.
    phi : float, optional
        Wilke-Chang association factor [-]; overrides the tabulated value.
    radius : float, optional
        Hydrodynamic radius for ``'stokes-einstein'`` [m]; by default the
        radius of a sphere of the solute's molar volume at its boiling point.

    Returns
    -------
    float or numpy.ndarray
        Diffusivity [m^2/s]; a float for scalar T.

    Raises
    ------
    OutOfRangeError
        If the solvent is frozen, boiling at P, or supercritical at T.
    MissingConstantError
        If a species lacks a constant the method needs.

    Notes
    -----
    Special rules (each recorded, with the value it changed, in the notes of
    :func:`masstransfer.diffusivity_report`; Poling, Prausnitz & O'Connell 2001, Section 11-9,
    from memory):

    * Wilke-Chang, water as the solute in an organic solvent: the value is divided by 2.3
      (Olander 1961).
    * Tyn-Calus and Hayduk-Minhas (general form), water as the solute: treated as a dimer,
      V_A and its parachor doubled; the same for an organic acid as the solute unless the
      solvent is water, methanol or a butanol.
    * The same two methods, a non-polar solute in a monohydroxy alcohol: V_B and the solvent
      parachor are multiplied by :math:`8\eta_B` (cP).  A solute whose dipole moment is
      unknown is not assumed non-polar; the rule is then not applied and a note says so.
    * Small molecules (H2, O2, N2, CO2, H2O, NH3, ...) use their tabulated molar volumes.
    * None of the methods is meant for viscous solvents (above about 20 mPa s); an
      :class:`~masstransfer.errors.EnvelopeWarning` is issued.
    * A strong electrolyte (salt, strong mineral acid, strong base) diffuses as ions: in water
      it takes ``'nernst-haskell'`` (limiting ionic diffusivities, infinite dilution, with a
      warning that concentrated solutions differ); the molecular methods refuse it, and so does
      every method in another solvent.  A single ion (``'sulfate'``) is refused: name its salt.

    Stated accuracy: about 10 % (Hayduk-Minhas, Tyn-Calus), 10-15 % (Wilke-Chang).  Results
    are estimates; check designs that affect safety against measured data and licensed
    engineering practice.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Sections 11-9 and 11-10.

    Examples
    --------
    >>> round(liquid_diffusivity("ethylbenzene", "water", 293.15) * 1e9, 2)
    0.7

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    r = ready_liquid(solute, solvent, method)
    check_shapes(T=Tv, P=Pv)
    check_liquid(r.limits, Tv, Pv, r.solute)
    if mu_solvent is None:
        from ..substances._properties import liquid_model

        mu: FloatOrArray = liquid_model(r.solvent).viscosity(Tv)
    else:
        mu = check_positive("mu_solvent", mu_solvent)
    check_shapes(T=Tv, mu_solvent=mu)
    lo, hi = r.record.T_range
    if (Tv < lo or Tv > hi) if isinstance(Tv, float) else bool(np.any((Tv < lo) | (Tv > hi))):
        warn_caller(
            f"{r.record.name}: T outside {lo:g}-{hi:g} K, the range the method is stated for",
            EnvelopeWarning,
        )
    for c in r.cautions:
        warn_caller(c, EnvelopeWarning)
    prep = r.prepared
    if phi is not None and r.record.name == "wilke-chang":
        prep = Prepared(
            (*prep.args[:2], check_positive("phi", phi), prep.args[3]), prep.constants, prep.notes
        )
    if radius is not None and r.record.name == "stokes-einstein":
        prep = Prepared((check_positive("radius", radius),), prep.constants, prep.notes, form=prep.form)
    return r.record.evaluate(prep, Tv, mu)  # type: ignore[no-any-return]
