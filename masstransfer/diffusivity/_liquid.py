"""Diffusion coefficients of dilute solutes in liquids.

Numbers in: :func:`wilke_chang`, :func:`hayduk_minhas_aqueous`,
:func:`hayduk_minhas`, :func:`hayduk_minhas_paraffin`, :func:`tyn_calus`,
:func:`stokes_einstein`.  Names in: :func:`liquid_diffusivity`, which
fetches the solvent viscosity from :mod:`masstransfer.substances` unless the
caller passes one, and applies the published special-case recommendations
(documented on :func:`liquid_diffusivity`).

All values are infinite-dilution diffusivities.  Estimates only: typical
errors are 10-20 %; check designs that affect safety against measured data.
"""

from __future__ import annotations

import functools
import math
from dataclasses import dataclass
from typing import Final, overload

import numpy as np

from .. import _tables as data
from .._frozen import FrozenResult
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_positive, check_shapes, finish, guard, warn_caller
from ..constants import AVOGADRO, BOLTZMANN, DEBYE
from ..errors import EnvelopeWarning, InputValueError
from ..substances._species import Species, species
from ._common import normalise_method

__all__ = [
    "LIQUID_METHODS",
    "LiquidDiffusivityInputs",
    "hayduk_minhas",
    "hayduk_minhas_aqueous",
    "hayduk_minhas_paraffin",
    "liquid_diffusivity",
    "liquid_diffusivity_inputs",
    "stokes_einstein",
    "tyn_calus",
    "wilke_chang",
]

#: Parachor conversion: SI [N^0.25 m^2.75/mol] -> tabulated cm-g-s form.
_PARACHOR_CGS: Final = 5.623413e6
#: Solvent viscosity above which the correlations warn [Pa s] (Poling et al.
#: 2001, Section 11-10: not for viscous solvents, about 20-30 cP).
VISCOUS_SOLVENT_LIMIT: Final = 0.02

LIQUID_METHODS: Final = {
    "wilke-chang": "Wilke & Chang (1955): about 10-15 %",
    "hayduk-minhas": "Hayduk & Minhas (1982), aqueous, paraffin or general form: about 10 %",
    "tyn-calus": "Tyn & Calus (1975): about 10 %",
    "stokes-einstein": "Stokes-Einstein: large spherical solutes and particles only",
}

_WATER = "7732-18-5"
_NON_DIMERISING_ACID_SOLVENTS = frozenset(
    {_WATER, "67-56-1", "71-36-3", "78-92-2", "78-83-1", "75-65-0"}  # water, methanol, butanols
)


def _cp(mu: FloatOrArray) -> FloatOrArray:
    return mu * 1000.0


def _warn_viscous(mu: FloatOrArray, method: str) -> None:
    high = mu > VISCOUS_SOLVENT_LIMIT if isinstance(mu, float) else bool(np.any(mu > VISCOUS_SOLVENT_LIMIT))
    if high:
        warn_caller(
            f"{method}: solvent viscosity above {VISCOUS_SOLVENT_LIMIT * 1e3:g} mPa s lies "
            "outside the range the correlation was fitted on (not for viscous solvents)",
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
    """Infinite-dilution liquid diffusivity by the Wilke-Chang correlation.

    .. math::

        D_{AB}^\\circ = \\frac{7.4\\times10^{-8}\\,(\\phi M_B)^{1/2}\\,T}
        {\\eta_B\\,V_A^{0.6}}

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
    """Infinite-dilution diffusivity in water by Hayduk and Minhas.

    .. math::

        D_{AW}^\\circ = 1.25\\times10^{-8}\\,(V_A^{-0.19} - 0.292)\\,T^{1.52}\\,
        \\eta_W^{\\varepsilon^*}, \\qquad \\varepsilon^* = 9.58/V_A - 1.12

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
    2001, Section 11-9).

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
    eps = 9.58 / Va - 1.12
    D_cgs = 1.25e-8 * (Va**-0.19 - 0.292) * Tv**1.52 * _cp(mu) ** eps
    return finish(D_cgs * 1e-4)


@guard
def hayduk_minhas_paraffin(T: ArrayLike, mu_solvent: ArrayLike, V_solute: float) -> FloatOrArray:
    """Infinite-dilution diffusivity in normal paraffins by Hayduk and Minhas.

    .. math::

        D_{AB}^\\circ = 13.3\\times10^{-8}\\,T^{1.47}\\,\\eta_B^{\\varepsilon}\\,V_A^{-0.71},
        \\qquad \\varepsilon = 10.2/V_A - 0.791

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
    """Infinite-dilution diffusivity in non-aqueous solvents by Hayduk and Minhas.

    .. math::

        D_{AB}^\\circ = 1.55\\times10^{-8}\\,T^{1.29}\\,
        \\frac{\\mathcal{P}_B^{0.5}\\,\\mathcal{P}_A^{-0.42}}{\\eta_B^{0.92}\\,V_B^{0.23}}

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
    """Infinite-dilution liquid diffusivity by the Tyn-Calus correlation.

    .. math::

        D_{AB}^\\circ = 8.93\\times10^{-8}\\,\\left(\\frac{V_A}{V_B^2}\\right)^{1/6}
        \\left(\\frac{\\mathcal{P}_B}{\\mathcal{P}_A}\\right)^{0.6}\\frac{T}{\\eta_B}

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
    """Diffusivity of a large sphere or particle by the Stokes-Einstein equation.

    .. math:: D = \\frac{k_B T}{c\\,\\pi\\,\\eta\\,r}, \\qquad c = 6
        \\text{ (stick) or } 4 \\text{ (slip)}

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


# --------------------------------------------------------------------------
# names in
# --------------------------------------------------------------------------


@dataclass(frozen=True, eq=False)
class LiquidDiffusivityInputs(FrozenResult):
    """The constants :func:`liquid_diffusivity` used, after special cases.

    Attributes
    ----------
    V_solute : float
        Solute molar volume at its normal boiling point [m^3/mol].
    V_solvent : float or None
        Solvent molar volume at its normal boiling point [m^3/mol].
    parachor_solute : float or None
        Solute parachor [N^0.25 m^2.75/mol].
    parachor_solvent : float or None
        Solvent parachor [N^0.25 m^2.75/mol].
    phi : float
        Wilke-Chang association factor [-].
    form : str
        Which form of the method was used.
    notes : tuple of str
        The special-case rules that were applied.

    """

    V_solute: float
    V_solvent: float | None
    parachor_solute: float | None
    parachor_solvent: float | None
    phi: float
    form: str
    notes: tuple[str, ...]


def _is_acid(s: Species) -> bool:
    mol = s.molecule
    if mol is None:
        return False
    from ..substances._species import _le_bas_class

    return any(el == "O" and _le_bas_class(mol, i) == "O_acid" for i, el in enumerate(mol.elements))


def _is_monohydroxy_alcohol(s: Species) -> bool:
    mol = s.molecule
    if mol is None or set(s.atoms) - {"C", "H", "O"} or s.atoms.get("O") != 1:
        return False
    i = mol.elements.index("O")
    nbrs = mol.neighbours(i)
    if len(nbrs) != 1 or nbrs[0][1] != 1.0:
        return False
    carbon = nbrs[0][0]
    return not any(o == 2.0 for _, o in mol.neighbours(carbon))


def _is_n_paraffin(s: Species) -> bool:
    n_c = s.atoms.get("C", 0)
    if set(s.atoms) != {"C", "H"} or s.atoms.get("H") != 2 * n_c + 2 or n_c < 5:
        return False
    mol = s.molecule
    if mol is None:
        return False
    return all(len(mol.neighbours(i)) <= 2 for i in range(len(mol.elements)))


def _is_nonpolar(s: Species) -> bool:
    return s.dipole is None or s.dipole < 0.5 * DEBYE


@guard
def liquid_diffusivity_inputs(
    solute: str | Species, solvent: str | Species, method: str = "wilke-chang"
) -> LiquidDiffusivityInputs:
    """Resolve the constants a liquid method needs, applying the special cases.

    Parameters
    ----------
    solute : str or Species
        Diffusing species.
    solvent : str or Species
        Solvent.
    method : str
        One of :data:`LIQUID_METHODS`.

    Returns
    -------
    LiquidDiffusivityInputs
        The molar volumes, parachors and association factor used, and the
        rules applied (see :func:`liquid_diffusivity`).

    Notes
    -----
    Molar volumes come from ``thermo`` at the normal boiling point, or Le
    Bas volumes; parachors from :func:`masstransfer.substances.parachor`.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Section 11-9.

    Examples
    --------
    >>> liquid_diffusivity_inputs("water", "ethanol", "tyn-calus").notes[0]
    'water as solute: treated as a dimer (V_A and parachor doubled)'

    """
    m = normalise_method(method, LIQUID_METHODS)
    a, b = species(solute), species(solvent)
    return _inputs(a, b, m)


@functools.lru_cache(maxsize=512)
def _inputs(a: Species, b: Species, m: str) -> LiquidDiffusivityInputs:
    """Apply the special-case rules once per (solute, solvent, method)."""
    notes: list[str] = []
    Va = a.require("Vb", m)
    phi = data.WILKE_CHANG_ASSOCIATION.get(b.CAS or "", 1.0)
    if m == "wilke-chang":
        if a.CAS == _WATER and b.CAS != _WATER:
            Va = 37.4e-6
            notes.append("water as solute: V_A = 37.4 cm^3/mol")
        return LiquidDiffusivityInputs(Va, None, None, None, phi, "wilke-chang", tuple(notes))
    if m == "stokes-einstein":
        return LiquidDiffusivityInputs(Va, None, None, None, phi, "stokes-einstein", ())
    if m == "hayduk-minhas" and b.CAS == _WATER:
        return LiquidDiffusivityInputs(Va, None, None, None, phi, "aqueous", ())
    if m == "hayduk-minhas" and _is_n_paraffin(b):
        return LiquidDiffusivityInputs(Va, None, None, None, phi, "n-paraffin", ())
    from ..substances._properties import parachor

    Vb = b.require("Vb", m)
    Pa, Pb = parachor(a), parachor(b)
    if a.CAS == _WATER:
        Va, Pa = 2 * Va, 2 * Pa
        notes.append("water as solute: treated as a dimer (V_A and parachor doubled)")
    elif _is_acid(a) and (b.CAS or "") not in _NON_DIMERISING_ACID_SOLVENTS:
        Va, Pa = 2 * Va, 2 * Pa
        notes.append("organic acid solute: treated as a dimer (V_A and parachor doubled)")
    form = "general" if m == "hayduk-minhas" else "tyn-calus"
    return LiquidDiffusivityInputs(Va, Vb, Pa, Pb, phi, form, tuple(notes))


@overload
def liquid_diffusivity(
    solute: str | Species,
    solvent: str | Species,
    T: float,
    method: str = ...,
    *,
    mu_solvent: float | None = ...,
    phi: float | None = ...,
    radius: float | None = ...,
) -> float: ...
@overload
def liquid_diffusivity(
    solute: str | Species,
    solvent: str | Species,
    T: FloatArray,
    method: str = ...,
    *,
    mu_solvent: ArrayLike | None = ...,
    phi: float | None = ...,
    radius: float | None = ...,
) -> FloatArray: ...
@overload
def liquid_diffusivity(
    solute: str | Species,
    solvent: str | Species,
    T: ArrayLike,
    method: str = ...,
    *,
    mu_solvent: ArrayLike | None = ...,
    phi: float | None = ...,
    radius: float | None = ...,
) -> FloatOrArray: ...
@guard
def liquid_diffusivity(
    solute: str | Species,
    solvent: str | Species,
    T: ArrayLike,
    method: str = "wilke-chang",
    *,
    mu_solvent: ArrayLike | None = None,
    phi: float | None = None,
    radius: float | None = None,
) -> FloatOrArray:
    """Infinite-dilution diffusivity of ``solute`` in liquid ``solvent``.

    Parameters
    ----------
    solute : str or Species
        Diffusing species: name, CAS number, formula, or :class:`Species`.
    solvent : str or Species
        Solvent, e.g. ``"water"``.
    T : float or array_like
        Temperature [K]; the solvent must be liquid there.
    method : {'wilke-chang', 'hayduk-minhas', 'tyn-calus', 'stokes-einstein'}
        Estimation method (see :data:`LIQUID_METHODS`).  ``'hayduk-minhas'``
        picks the aqueous form for water, the n-paraffin form for normal
        alkane solvents and the general form otherwise.
    mu_solvent : float or array_like, optional
        Solvent viscosity [Pa s]; from :func:`masstransfer.liquid_model`
        when omitted.
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
        If the solvent is not liquid at T (and no viscosity is given).
    MissingConstantError
        If a species lacks a constant the method needs.

    Notes
    -----
    Special cases applied (Poling, Prausnitz & O'Connell 2001, Section
    11-9, from memory):

    * Wilke-Chang, water as the solute in an organic solvent: V_A is taken
      as 37.4 cm^3/mol.
    * Tyn-Calus and Hayduk-Minhas (general form), water as the solute: it
      is treated as a dimer, V_A and its parachor doubled.
    * The same for an organic acid as the solute, unless the solvent is
      water, methanol or a butanol.
    * The same two methods, a non-polar solute in a monohydroxy alcohol:
      V_B and the solvent parachor are multiplied by :math:`8\\eta_B` (cP).
    * None of the methods is meant for viscous solvents (above about
      20 mPa s); an :class:`~masstransfer.errors.EnvelopeWarning` is issued.

    Typical errors: 10-20 % (Wilke-Chang), about 10 % (Hayduk-Minhas,
    Tyn-Calus).  Results are estimates; check designs that affect safety
    against measured data and licensed engineering practice.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Sections 11-9 and 11-10.

    Examples
    --------
    >>> round(liquid_diffusivity("ethylbenzene", "water", 293.15) * 1e9, 2)
    0.77

    """
    m = normalise_method(method, LIQUID_METHODS)
    Tv = check_positive("T", T)
    inp = liquid_diffusivity_inputs(solute, solvent, m)
    if mu_solvent is None:
        from ..substances._properties import liquid_model

        mu: FloatOrArray = liquid_model(solvent).viscosity(Tv)
    else:
        mu = check_positive("mu_solvent", mu_solvent)
    check_shapes(T=Tv, mu_solvent=mu)
    if m == "wilke-chang":
        b = species(solvent)
        f = inp.phi if phi is None else phi
        return wilke_chang(Tv, mu, b.molar_mass, inp.V_solute, f)
    if m == "stokes-einstein":
        r = radius
        if r is None:
            r = (3.0 * inp.V_solute / (4.0 * math.pi * AVOGADRO)) ** (1.0 / 3.0)
        return stokes_einstein(Tv, mu, r)
    if inp.form == "aqueous":
        return hayduk_minhas_aqueous(Tv, mu, inp.V_solute)
    if inp.form == "n-paraffin":
        return hayduk_minhas_paraffin(Tv, mu, inp.V_solute)
    assert inp.V_solvent is not None
    assert inp.parachor_solute is not None
    assert inp.parachor_solvent is not None
    Vb: FloatOrArray = inp.V_solvent
    Pb: FloatOrArray = inp.parachor_solvent
    a, b = species(solute), species(solvent)
    if _is_nonpolar(a) and _is_monohydroxy_alcohol(b):
        factor = 8.0 * np.asarray(mu) * 1000.0
        Vb = finish(Vb * factor)
        Pb = finish(Pb * factor)
    if inp.form == "general":
        return hayduk_minhas(Tv, mu, Vb, inp.parachor_solute, Pb)
    return tyn_calus(Tv, mu, inp.V_solute, Vb, inp.parachor_solute, Pb)
