"""Binary diffusion coefficients in gases at low pressure.

Two layers, as everywhere in the library:

* numbers in, numbers out: :func:`fuller`, :func:`chapman_enskog`,
  :func:`wilke_lee`, :func:`brokaw`, :func:`blanc`, plus
  :func:`neufeld_collision_integral` and :func:`fuller_volume`;
* names in: :func:`gas_diffusivity` and :func:`gas_diffusivity_in_mixture`
  resolve the species once (cached) and call the numeric layer.

All low-pressure methods give :math:`D_{AB} \\propto 1/P`; above about
1 MPa the product :math:`PD_{AB}` starts to fall and the methods warn.
Estimates only: check designs that affect safety against measured data.
"""

from __future__ import annotations

import math
from collections.abc import Mapping
from typing import Final, overload

import numpy as np

from .. import _tables as data
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import (
    call_with_quantities,
    check_nonnegative,
    check_positive,
    check_shapes,
    finish,
    guard,
    has_quantity,
    scalar,
    warn_caller,
)
from ..constants import DEBYE
from ..errors import EnvelopeWarning, InputValueError, MissingConstantError
from ..substances._species import Species, species
from ._common import normalise_method

__all__ = [
    "GAS_METHODS",
    "blanc",
    "brokaw",
    "chapman_enskog",
    "fuller",
    "fuller_volume",
    "gas_diffusivity",
    "gas_diffusivity_in_mixture",
    "neufeld_collision_integral",
    "rescale_gas_diffusivity",
    "wilke_lee",
]

#: Pressure above which the low-pressure methods warn [Pa] (common practice:
#: the ideal-gas kinetic theory behind them holds to roughly 10 bar).
LOW_PRESSURE_LIMIT: Final = 1.0e6

#: Accepted ``method=`` names of :func:`gas_diffusivity` and the average
#: absolute error their sources report, for messages and reports.
GAS_METHODS: Final = {
    "fuller": "Fuller, Schettler & Giddings (1966; volumes of 1969): about 4-5 % on non-polar pairs",
    "chapman-enskog": "Chapman-Enskog with Neufeld collision integral: about 7-8 %",
    "wilke-lee": "Wilke & Lee (1955): about 5-7 %",
    "brokaw": "Brokaw (1969) for polar pairs: about 7-10 %",
}

_BAR = 1.0e5


def _check_M(name: str, M: FloatOrArray) -> None:
    big = M > 1.0 if isinstance(M, float) else bool(np.any(M > 1.0))
    if big:
        raise InputValueError(
            f"{name} has a value above 1 kg/mol, implausible for a gas; molar masses are in "
            "kg/mol (divide g/mol by 1000)"
        )


def _warn_pressure(P: FloatOrArray, method: str) -> None:
    high = P > LOW_PRESSURE_LIMIT if isinstance(P, float) else bool(np.any(P > LOW_PRESSURE_LIMIT))
    if high:
        warn_caller(
            f"{method}: P above {LOW_PRESSURE_LIMIT:g} Pa lies outside the low-pressure range "
            "of the method (about 10 bar); D*P falls at high pressure, so the estimate is high",
            EnvelopeWarning,
        )


@overload
def fuller(T: float, P: float, M_a: float, M_b: float, v_a: float, v_b: float) -> float: ...
@overload
def fuller(T: FloatArray, P: ArrayLike, M_a: float, M_b: float, v_a: float, v_b: float) -> FloatArray: ...
@overload
def fuller(T: ArrayLike, P: ArrayLike, M_a: float, M_b: float, v_a: float, v_b: float) -> FloatOrArray: ...
@guard(check_output=False)
def fuller(
    T: ArrayLike,
    P: ArrayLike,
    M_a: float,
    M_b: float,
    v_a: float,
    v_b: float,
) -> FloatOrArray:
    """Binary gas diffusivity by the method of Fuller, Schettler and Giddings.

    .. math::

        D_{AB} = \\frac{0.00143\\,T^{1.75}}
        {P\\,M_{AB}^{1/2}\\,\\left[(\\Sigma_v)_A^{1/3} + (\\Sigma_v)_B^{1/3}\\right]^2},
        \\qquad M_{AB} = \\frac{2}{1/M_A + 1/M_B}

    with :math:`D_{AB}` in cm^2/s, P in bar and M in g/mol in the source;
    this function takes and returns SI units.

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    M_a : float
        Molar mass of species A [kg/mol].
    M_b : float
        Molar mass of species B [kg/mol].
    v_a : float
        Diffusion volume of A [cm^3/mol, the method's nominal unit]
        (see :func:`fuller_volume`).
    v_b : float
        Diffusion volume of B [cm^3/mol, the method's nominal unit].

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s].

    Notes
    -----
    Poling, Prausnitz & O'Connell (2001, Table 11-2) report an average
    absolute error of about 5 % for this method on non-polar and weakly
    polar pairs at low pressure; errors of 10-20 % occur for strongly polar
    or associating species.  An estimate, not a measurement.

    References
    ----------
    Fuller, E. N., Schettler, P. D., & Giddings, J. C. (1966). A new method
    for prediction of binary gas-phase diffusion coefficients. *Ind. Eng.
    Chem.* 58(5), 18-27. https://doi.org/10.1021/ie50677a007

    Fuller, E. N., Ensley, K., & Giddings, J. C. (1969). *J. Phys. Chem.*
    73, 3679-3685. https://doi.org/10.1021/j100845a020

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-4.4).

    Examples
    --------
    Methanol (v = 31.25) in air (v = 19.7) at 298 K and 1 atm:

    >>> round(fuller(298.0, 101325.0, 0.03204, 0.02896, 31.25, 19.7) * 1e6, 2)
    15.97

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    Ma = check_positive("M_a", M_a)
    Mb = check_positive("M_b", M_b)
    va = check_positive("v_a", v_a)
    vb = check_positive("v_b", v_b)
    _check_M("M_a", Ma)
    _check_M("M_b", Mb)
    _warn_pressure(Pv, "fuller")
    c = _fuller_constant(Ma, Mb, va, vb)
    return finish(c * Tv**1.75 / Pv)


def _fuller_constant(Ma: FloatOrArray, Mb: FloatOrArray, va: FloatOrArray, vb: FloatOrArray) -> FloatOrArray:
    """Everything in Fuller's equation but T^1.75/P, in SI (m^2/s * Pa / K^1.75)."""
    M_ab = 2.0 / (1.0 / (Ma * 1000.0) + 1.0 / (Mb * 1000.0))
    # 0.00143 cm^2/s bar -> 1e-4 m^2/cm^2 * 1e5 Pa/bar
    return finish(0.00143 * 1e-4 * _BAR / (M_ab**0.5 * (va ** (1.0 / 3.0) + vb ** (1.0 / 3.0)) ** 2))


@guard
def fuller_volume(sp: str | Species) -> float:
    """Fuller diffusion volume of a species, from its formula and structure.

    .. math:: \\Sigma_v = \\sum_i n_i v_i + n_{\\mathrm{rings}}\\,\\Delta v_{\\mathrm{ring}}

    The special-molecule volume is used where the source tabulates one
    (H2, N2, O2, air, CO2, H2O, NH3, ...).  Otherwise atomic increments for
    C, H, O, N, F, Cl, Br, I and S are summed and -18.3 is added for each
    aromatic or heterocyclic ring found in the species' SMILES.

    Parameters
    ----------
    sp : str or Species
        The species (name, CAS number, formula or :class:`Species`).

    Returns
    -------
    float
        Diffusion volume [cm^3/mol, the method's nominal unit].

    Raises
    ------
    MissingConstantError
        If the species holds an element with no published increment.

    Notes
    -----
    Volumes: Fuller, Ensley & Giddings (1969) as tabulated in Poling,
    Prausnitz & O'Connell (2001), Table 11-1 (see :mod:`masstransfer._tables`).
    A user-supplied ``Species.fuller_volume`` takes precedence.

    References
    ----------
    Fuller, E. N., Ensley, K., & Giddings, J. C. (1969). *J. Phys. Chem.*
    73, 3679-3685. https://doi.org/10.1021/j100845a020

    Examples
    --------
    >>> round(fuller_volume("toluene"), 2)
    111.48

    """
    s = species(sp)
    if s.fuller_volume is not None:
        return s.fuller_volume
    if not s.atoms:
        raise MissingConstantError(
            f"species {s.name!r} has no formula, so its Fuller volume cannot be summed; "
            "supply it: Species(..., fuller_volume=...)"
        )
    total = 0.0
    for el, n in s.atoms.items():
        inc = data.FULLER_ATOMIC_VOLUMES.get(el)
        if inc is None:
            raise MissingConstantError(
                f"the Fuller method has no diffusion volume for element {el!r} in {s.name!r}; "
                "use method='chapman-enskog', or supply Species(..., fuller_volume=...)"
            )
        total += n * inc
    mol = s.molecule
    if mol is not None:
        for ring in mol.rings:
            if ring.aromatic or ring.hetero:
                total += data.FULLER_RING_INCREMENT
    return total


# Neufeld, Janzen & Aziz (1972) constants, as in Poling et al. 5th ed. Eq. (11-3.6).
_NEUFELD: Final = (1.06036, 0.15610, 0.19300, 0.47635, 1.03587, 1.52996, 1.76474, 3.89411)
_TSTAR_RANGE: Final = (0.3, 100.0)


@guard
def neufeld_collision_integral(T_star: ArrayLike) -> FloatOrArray:
    """Diffusion collision integral of the Lennard-Jones 12-6 potential.

    .. math::

        \\Omega_D = \\frac{A}{T^{*B}} + \\frac{C}{e^{DT^*}} + \\frac{E}{e^{FT^*}}
        + \\frac{G}{e^{HT^*}}

    Parameters
    ----------
    T_star : float or array_like
        Reduced temperature :math:`kT/\\varepsilon_{AB}` [-].

    Returns
    -------
    float or numpy.ndarray
        Collision integral :math:`\\Omega_D` [-].

    Notes
    -----
    Fitted for :math:`0.3 \\le T^* \\le 100`; a warning is issued outside.

    References
    ----------
    Neufeld, P. D., Janzen, A. R., & Aziz, R. A. (1972). Empirical equations
    to calculate 16 of the transport collision integrals Omega(l,s)* for the
    Lennard-Jones (12-6) potential. *J. Chem. Phys.* 57, 1100-1102.
    https://doi.org/10.1063/1.1678363

    Examples
    --------
    >>> round(neufeld_collision_integral(1.0), 4)
    1.4405

    """
    Ts = check_positive("T_star", T_star)
    return _omega_d(Ts)


def _omega_d(Ts: FloatOrArray) -> FloatOrArray:
    """Neufeld collision integral without argument checks (T* already positive)."""
    lo, hi = _TSTAR_RANGE
    out_of = (Ts < lo or Ts > hi) if isinstance(Ts, float) else bool(np.any((Ts < lo) | (Ts > hi)))
    if out_of:
        warn_caller(
            f"Neufeld collision integral: T* = kT/epsilon outside {lo}-{hi}, the range of the fit",
            EnvelopeWarning,
        )
    A, B, C, D, E, F, G, H = _NEUFELD
    if isinstance(Ts, float):  # scalar fast path: math.exp avoids numpy's per-call overhead
        return float(A / Ts**B + C * math.exp(-D * Ts) + E * math.exp(-F * Ts) + G * math.exp(-H * Ts))
    return finish(A / Ts**B + C * np.exp(-D * Ts) + E * np.exp(-F * Ts) + G * np.exp(-H * Ts))


def _kinetic(
    Tv: FloatOrArray,
    Pv: FloatOrArray,
    constant: float,
    M_ab: float,
    sigma_a: float,
    eps: float,
    delta2: float,
) -> FloatOrArray:
    """Chapman-Enskog form shared by three methods (inputs already checked).

    ``constant`` is 0.00266 (Chapman-Enskog, Brokaw) or Wilke-Lee's
    :math:`(3.03 - 0.98/M_{AB}^{1/2})10^{-3}`; ``sigma_a`` in angstrom;
    ``delta2`` is Brokaw's polar term :math:`\\delta_{AB}^2` (0 otherwise).
    """
    Ts = Tv / eps
    omega = _omega_d(Ts)
    if delta2:
        omega = omega + 0.19 * delta2 / Ts
    return finish(constant * 1e-4 * _BAR * Tv**1.5 / (Pv * M_ab**0.5 * sigma_a**2 * omega))


def _m_ab(Ma: float, Mb: float) -> float:
    """Reduced-mass form used by Poling et al.: 2/(1/M_A + 1/M_B) in g/mol."""
    return 2.0 / (1.0 / (Ma * 1000.0) + 1.0 / (Mb * 1000.0))


def _brokaw_pair(
    Vb_a: float, Vb_b: float, Tb_a: float, Tb_b: float, dipole_a: float, dipole_b: float
) -> tuple[float, float, float]:
    """Brokaw's Stockmayer parameters for a pair: (sigma_AB [angstrom], eps_AB/k [K], delta_AB^2)."""

    def params(Vb: float, Tb: float, mu: float) -> tuple[float, float, float]:
        V = Vb * 1e6
        delta = 1.94e3 * (mu / DEBYE) ** 2 / (V * Tb)
        eps = 1.18 * (1.0 + 1.3 * delta**2) * Tb
        sig = (1.585 * V / (1.0 + 1.3 * delta**2)) ** (1.0 / 3.0)
        return delta, eps, sig

    da, ea, sa = params(Vb_a, Tb_a, dipole_a)
    db, eb, sb = params(Vb_b, Tb_b, dipole_b)
    return math.sqrt(sa * sb), math.sqrt(ea * eb), da * db


@guard
def chapman_enskog(
    T: ArrayLike,
    P: ArrayLike,
    M_a: float,
    M_b: float,
    sigma_ab: float,
    epsilon_ab_k: float,
) -> FloatOrArray:
    """Binary gas diffusivity from Chapman-Enskog kinetic theory.

    .. math::

        D_{AB} = \\frac{0.00266\\,T^{3/2}}{P\\,M_{AB}^{1/2}\\,\\sigma_{AB}^2\\,\\Omega_D}

    (cm^2/s, bar, angstrom, g/mol in the source; SI here), with
    :math:`\\Omega_D` from :func:`neufeld_collision_integral` at
    :math:`T^* = T/(\\varepsilon_{AB}/k)`.

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    M_a : float
        Molar mass of A [kg/mol].
    M_b : float
        Molar mass of B [kg/mol].
    sigma_ab : float
        Pair collision diameter [m], usually :math:`(\\sigma_A+\\sigma_B)/2`.
    epsilon_ab_k : float
        Pair well depth over Boltzmann's constant [K], usually
        :math:`\\sqrt{\\varepsilon_A\\varepsilon_B}/k`.

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s].

    Notes
    -----
    With Lennard-Jones parameters from viscosity data, Poling et al.
    (2001, Table 11-2) report an average absolute error of about 7 % for
    non-polar pairs.  First approximation of the theory (the correction
    factor :math:`f_D`, within about 3 % of unity, is taken as 1).

    References
    ----------
    Hirschfelder, J. O., Curtiss, C. F., & Bird, R. B. (1954). *Molecular
    Theory of Gases and Liquids*. Wiley.

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-3.2).

    Examples
    --------
    >>> round(chapman_enskog(298.15, 101325.0, 0.028, 0.032, 3.6e-10, 90.0) * 1e6, 2)
    20.61

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    Ma = check_positive("M_a", M_a)
    Mb = check_positive("M_b", M_b)
    s = check_positive("sigma_ab", scalar("sigma_ab", sigma_ab))
    e = check_positive("epsilon_ab_k", scalar("epsilon_ab_k", epsilon_ab_k))
    Ma = check_positive("M_a", scalar("M_a", Ma))
    Mb = check_positive("M_b", scalar("M_b", Mb))
    _check_M("M_a", Ma)
    _check_M("M_b", Mb)
    _warn_pressure(Pv, "chapman_enskog")
    return _kinetic(Tv, Pv, 0.00266, _m_ab(float(Ma), float(Mb)), float(s) * 1e10, float(e), 0.0)


@guard
def wilke_lee(
    T: ArrayLike,
    P: ArrayLike,
    M_a: float,
    M_b: float,
    sigma_ab: float,
    epsilon_ab_k: float,
) -> FloatOrArray:
    """Binary gas diffusivity by the Wilke-Lee modification of Chapman-Enskog.

    .. math::

        D_{AB} = \\frac{\\left[3.03 - 0.98/M_{AB}^{1/2}\\right]10^{-3}\\,T^{3/2}}
        {P\\,M_{AB}^{1/2}\\,\\sigma_{AB}^2\\,\\Omega_D}

    (cm^2/s, bar, angstrom, g/mol in the source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    M_a : float
        Molar mass of A [kg/mol].
    M_b : float
        Molar mass of B [kg/mol].
    sigma_ab : float
        Pair collision diameter [m].
    epsilon_ab_k : float
        Pair well depth over Boltzmann's constant [K].

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s].

    Notes
    -----
    Wilke and Lee fitted the constant to measured data for pairs involving
    larger vapours; for a species without tabulated Lennard-Jones values
    :func:`gas_diffusivity` uses their estimates
    :math:`\\sigma = 1.18\\,V_b^{1/3}` (angstrom, cm^3/mol) and
    :math:`\\varepsilon/k = 1.15\\,T_b`.  Average absolute error about
    5-7 % (Poling et al. 2001, Table 11-2).

    References
    ----------
    Wilke, C. R., & Lee, C. Y. (1955). Estimation of diffusion coefficients
    for gases and vapors. *Ind. Eng. Chem.* 47, 1253-1257.
    https://doi.org/10.1021/ie50546a056

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-4.1).

    Examples
    --------
    >>> round(wilke_lee(298.15, 101325.0, 0.028, 0.032, 3.6e-10, 90.0) * 1e6, 2)
    22.09

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    Ma = check_positive("M_a", scalar("M_a", M_a))
    Mb = check_positive("M_b", scalar("M_b", M_b))
    s = check_positive("sigma_ab", scalar("sigma_ab", sigma_ab))
    e = check_positive("epsilon_ab_k", scalar("epsilon_ab_k", epsilon_ab_k))
    _check_M("M_a", Ma)
    _check_M("M_b", Mb)
    _warn_pressure(Pv, "wilke_lee")
    M_ab = _m_ab(float(Ma), float(Mb))
    return _kinetic(Tv, Pv, _wilke_lee_constant(M_ab), M_ab, float(s) * 1e10, float(e), 0.0)


def _wilke_lee_constant(M_ab: float) -> float:
    """Wilke and Lee's replacement for the constant 0.00266 (M_AB in g/mol)."""
    return (3.03 - 0.98 / math.sqrt(M_ab)) * 1e-3


@guard
def brokaw(
    T: ArrayLike,
    P: ArrayLike,
    M_a: float,
    M_b: float,
    Vb_a: float,
    Vb_b: float,
    Tb_a: float,
    Tb_b: float,
    dipole_a: float,
    dipole_b: float,
) -> FloatOrArray:
    """Binary gas diffusivity for polar pairs by Brokaw's method.

    Stockmayer-potential collision integral and parameters:

    .. math::

        \\Omega_D = \\Omega_D^{\\mathrm{Neufeld}} + \\frac{0.19\\,\\delta_{AB}^2}{T^*},
        \\quad \\delta = \\frac{1.94\\times10^3\\,\\mu_p^2}{V_b T_b},
        \\quad \\varepsilon/k = 1.18(1 + 1.3\\delta^2)T_b,
        \\quad \\sigma = \\left(\\frac{1.585\\,V_b}{1 + 1.3\\delta^2}\\right)^{1/3}

    with geometric-mean combining rules for :math:`\\delta`,
    :math:`\\varepsilon` and :math:`\\sigma`, then the Chapman-Enskog
    equation (:math:`\\mu_p` in debye, :math:`V_b` in cm^3/mol, σ in
    angstrom in the source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    M_a : float
        Molar mass of A [kg/mol].
    M_b : float
        Molar mass of B [kg/mol].
    Vb_a : float
        Liquid molar volume of A at its normal boiling point [m^3/mol].
    Vb_b : float
        Liquid molar volume of B at its normal boiling point [m^3/mol].
    Tb_a : float
        Normal boiling point of A [K].
    Tb_b : float
        Normal boiling point of B [K].
    dipole_a : float
        Dipole moment of A [C m] (zero for a non-polar species).
    dipole_b : float
        Dipole moment of B [C m].

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s].

    Notes
    -----
    Poling et al. (2001, Table 11-2) find errors comparable to the
    non-polar methods (about 7-10 %) for polar pairs.

    References
    ----------
    Brokaw, R. S. (1969). Predicting transport properties of dilute gases.
    *Ind. Eng. Chem. Process Des. Dev.* 8, 240-253.
    https://doi.org/10.1021/i260030a015

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-3.8).

    Examples
    --------
    Methyl chloride and sulfur dioxide at 323 K and 1 bar:

    >>> D = brokaw(323.0, 1e5, 0.05049, 0.06406, 50.6e-6, 43.8e-6, 249.1, 263.2,
    ...            1.9 * 3.33564e-30, 1.6 * 3.33564e-30)
    >>> round(D * 1e4, 3)
    0.084

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    Ma = check_positive("M_a", scalar("M_a", M_a))
    Mb = check_positive("M_b", scalar("M_b", M_b))
    for name, v in (("Vb_a", Vb_a), ("Vb_b", Vb_b), ("Tb_a", Tb_a), ("Tb_b", Tb_b)):
        check_positive(name, scalar(name, v))
    for name, v in (("dipole_a", dipole_a), ("dipole_b", dipole_b)):
        check_nonnegative(name, scalar(name, v), f"pass a finite dipole moment >= 0 [C m] for {name}")
    _check_M("M_a", Ma)
    _check_M("M_b", Mb)
    _warn_pressure(Pv, "brokaw")
    s_ab, e_ab, d2 = _brokaw_pair(
        float(Vb_a), float(Vb_b), float(Tb_a), float(Tb_b), float(dipole_a), float(dipole_b)
    )
    return _kinetic(Tv, Pv, 0.00266, _m_ab(float(Ma), float(Mb)), s_ab, e_ab, d2)


@guard
def blanc(D_binary: ArrayLike, mole_fractions: ArrayLike) -> FloatOrArray:
    """Diffusivity of a dilute solute in a gas mixture by Blanc's law.

    .. math:: \\frac{1}{D_{1m}} = \\sum_{j\\ne 1} \\frac{y_j'}{D_{1j}},
        \\qquad y_j' = y_j / \\textstyle\\sum_{k\\ne1} y_k

    Parameters
    ----------
    D_binary : array_like
        Binary diffusivities of the solute in each carrier component
        [m^2/s]; the last axis runs over components.
    mole_fractions : array_like
        Mole fractions of the carrier components [-] (solute-free basis;
        renormalised to sum to one), same last axis.

    Returns
    -------
    float or numpy.ndarray
        Effective diffusivity of the solute in the mixture [m^2/s].

    Notes
    -----
    Exact for a solute at trace level in a mixture of gases; for
    non-dilute solutes use the Maxwell-Stefan equations.

    References
    ----------
    Blanc, A. (1908). Recherches sur les mobilités des ions dans les gaz.
    *J. Phys. Theor. Appl.* 7, 825-839.

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-7.2).

    Examples
    --------
    >>> round(blanc([2.0e-5, 1.0e-5], [0.5, 0.5]) * 1e5, 4)
    1.3333

    """
    D = np.asarray(check_positive("D_binary", D_binary), dtype=float)
    y = np.asarray(check_positive("mole_fractions", mole_fractions), dtype=float)
    if D.ndim == 0 or y.ndim == 0 or D.shape[-1] != y.shape[-1]:
        raise InputValueError(
            "D_binary and mole_fractions need one entry per carrier component along their last "
            f"axis (got shapes {D.shape} and {y.shape}); pass matching lists"
        )
    yn = y / y.sum(axis=-1, keepdims=True)
    return finish(1.0 / np.sum(yn / D, axis=-1))


@guard
def rescale_gas_diffusivity(
    D_ref: ArrayLike,
    T_ref: float,
    P_ref: float,
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    exponent: float = 1.75,
) -> FloatOrArray:
    """Carry a measured gas diffusivity to another temperature and pressure.

    .. math:: D(T, P) = D_{ref}\\,\\left(\\frac{T}{T_{ref}}\\right)^{n}\\,\\frac{P_{ref}}{P}

    Parameters
    ----------
    D_ref : float or array_like
        Diffusivity measured at (T_ref, P_ref) [m^2/s].
    T_ref : float
        Temperature of the measurement [K].
    P_ref : float
        Pressure of the measurement [Pa].
    T : float or array_like
        Target temperature [K].
    P : float or array_like
        Target pressure [Pa].
    exponent : float
        Temperature exponent n [-]: 1.75 (Fuller's; the default) or 1.5
        (Chapman-Enskog without the change of the collision integral).

    Returns
    -------
    float or numpy.ndarray
        Diffusivity at (T, P) [m^2/s].

    Notes
    -----
    The exponent 1.75 reproduces most measured pairs within a few per cent
    over a few hundred kelvin (Poling et al. 2001, Section 11-4).

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Section 11-4.

    Examples
    --------
    >>> round(rescale_gas_diffusivity(2.6e-5, 298.15, 101325.0, 353.15) * 1e5, 3)
    3.497

    """
    D0 = check_positive("D_ref", D_ref)
    T0 = check_positive("T_ref", T_ref)
    P0 = check_positive("P_ref", P_ref)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    n = check_positive("exponent", exponent)
    check_shapes(D_ref=D0, T=Tv, P=Pv)
    return finish(D0 * (Tv / T0) ** n * (P0 / Pv))


# --------------------------------------------------------------------------
# names in
# --------------------------------------------------------------------------


def _lj_pair(a: Species, b: Species, method: str) -> tuple[float, float]:
    sa, sb = a.require("sigma", method), b.require("sigma", method)
    ea, eb = a.require("epsilon_k", method), b.require("epsilon_k", method)
    return 0.5 * (sa + sb), math.sqrt(ea * eb)


def _wilke_lee_params(s: Species) -> tuple[float, float]:
    """Tabulated LJ values, else Wilke & Lee's estimates from Tb and Vb."""
    tabulated = (
        "tabulated" in s.sources.get("sigma", "")
        or "Svehla" in s.sources.get("sigma", "")
        or s.sources.get("sigma", "").startswith(("masstransfer._tables", "user"))
    )
    if s.sigma is not None and s.epsilon_k is not None and tabulated:
        return s.sigma, s.epsilon_k
    if s.Vb is not None and s.Tb is not None:
        return 1.18e-10 * (s.Vb * 1e6) ** (1.0 / 3.0), 1.15 * s.Tb
    return s.require("sigma", "Wilke-Lee"), s.require("epsilon_k", "Wilke-Lee")


_PREPARED: dict[tuple[str, object, object], tuple[float, ...]] = {}
_METHOD_KEYS: Final = {name: name for name in GAS_METHODS}


def _prepare(method: str, solute: str | Species, carrier: str | Species) -> tuple[float, ...]:
    key = (method, solute, carrier)
    try:
        got = _PREPARED.get(key)
    except TypeError:  # an unhashable identifier: let species() explain what it expects
        species(solute)
        species(carrier)
        raise
    if got is not None:
        return got
    a, b = species(solute), species(carrier)
    Ma, Mb = a.molar_mass, b.molar_mass
    prepared: tuple[float, ...]
    if method == "fuller":
        prepared = (float(_fuller_constant(Ma, Mb, fuller_volume(a), fuller_volume(b))),)
    elif method == "chapman-enskog":
        s, e = _lj_pair(a, b, "Chapman-Enskog")
        prepared = (0.00266, _m_ab(Ma, Mb), s * 1e10, e, 0.0)
    elif method == "wilke-lee":
        sa, ea = _wilke_lee_params(a)
        sb, eb = _wilke_lee_params(b)
        M_ab = _m_ab(Ma, Mb)
        prepared = (_wilke_lee_constant(M_ab), M_ab, 0.5 * (sa + sb) * 1e10, math.sqrt(ea * eb), 0.0)
    else:  # brokaw
        s_ab, e_ab, d2 = _brokaw_pair(
            a.require("Vb", "Brokaw"),
            b.require("Vb", "Brokaw"),
            a.require("Tb", "Brokaw"),
            b.require("Tb", "Brokaw"),
            a.dipole or 0.0,
            b.dipole or 0.0,
        )
        prepared = (0.00266, _m_ab(Ma, Mb), s_ab, e_ab, d2)
    if len(_PREPARED) > 4096:
        _PREPARED.clear()
    _PREPARED[key] = prepared
    return prepared


@overload
def gas_diffusivity(
    solute: str | Species, carrier: str | Species, T: float, P: float = ..., method: str = ...
) -> float: ...
@overload
def gas_diffusivity(
    solute: str | Species, carrier: str | Species, T: FloatArray, P: ArrayLike = ..., method: str = ...
) -> FloatArray: ...
@overload
def gas_diffusivity(
    solute: str | Species, carrier: str | Species, T: ArrayLike, P: ArrayLike = ..., method: str = ...
) -> FloatOrArray: ...
def gas_diffusivity(
    solute: str | Species,
    carrier: str | Species,
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    method: str = "fuller",
) -> FloatOrArray:
    """Binary diffusivity of ``solute`` in ``carrier`` gas, from species names.

    Parameters
    ----------
    solute : str or Species
        Diffusing species: name, CAS number, formula, or :class:`Species`.
    carrier : str or Species
        Carrier gas, e.g. ``"air"``, ``"nitrogen"``.
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    method : {'fuller', 'chapman-enskog', 'wilke-lee', 'brokaw'}
        Estimation method (see :data:`GAS_METHODS`); ``'brokaw'`` is meant
        for pairs with a polar member.

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s]; a float for scalar T and P.

    Raises
    ------
    UnknownSpeciesError
        If a species cannot be resolved.
    MissingConstantError
        If a species lacks a constant the method needs.
    InputValueError
        For non-finite or non-positive T or P, or mismatched shapes.

    Notes
    -----
    Species are resolved and the method's constants prepared once per
    (method, solute, carrier); later calls cost microseconds.  Typical
    errors: Fuller about 5 %, Chapman-Enskog about 7 %, Wilke-Lee 5-7 %,
    Brokaw 7-10 % (Poling et al. 2001, Table 11-2).  Results are estimates:
    designs that affect safety (toxic or flammable vapour, oxygen ingress
    into food, pressure equipment) must be checked against measured data,
    local codes and licensed engineering practice.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Chapter 11.

    Examples
    --------
    >>> round(gas_diffusivity("water", "air", 298.15) * 1e6, 1)
    25.0
    >>> round(gas_diffusivity("hydrogen", "nitrogen", 294.0, 2 * 101325.0,
    ...                       method="chapman-enskog") * 1e4, 3)
    0.361

    """
    if (type(T) is not float or type(P) is not float) and has_quantity((T, P), {}):  # pint: units
        return call_with_quantities(gas_diffusivity, (solute, carrier, T, P, method), {})
    m = (_METHOD_KEYS.get(method) if type(method) is str else None) or normalise_method(method, GAS_METHODS)
    prepared = _prepare(m, solute, carrier)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    if m == "fuller" and isinstance(Tv, float) and isinstance(Pv, float):  # scalar fast path
        if Pv > LOW_PRESSURE_LIMIT:
            _warn_pressure(Pv, "gas_diffusivity(method='fuller')")
        return float(prepared[0] * Tv**1.75 / Pv)
    check_shapes(T=Tv, P=Pv)
    _warn_pressure(Pv, f"gas_diffusivity(method={m!r})")
    if m == "fuller":
        return finish(prepared[0] * Tv**1.75 / Pv)
    c, M_ab, sig, eps, d2 = prepared
    return _kinetic(Tv, Pv, c, M_ab, sig, eps, d2)


@guard
def gas_diffusivity_in_mixture(
    solute: str | Species,
    carrier: Mapping[str, float] | Mapping[str | Species, float],
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    method: str = "fuller",
) -> FloatOrArray:
    """Diffusivity of a dilute ``solute`` in a gas mixture (Blanc's law).

    Parameters
    ----------
    solute : str or Species
        Diffusing species at trace level.
    carrier : mapping
        Carrier components and their mole fractions [-], e.g.
        ``{"nitrogen": 0.79, "CO2": 0.21}``; renormalised to sum to one.
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    method : str
        Binary method, as in :func:`gas_diffusivity`.

    Returns
    -------
    float or numpy.ndarray
        Effective diffusivity of the solute [m^2/s].

    Notes
    -----
    Blanc's law holds for a solute at trace level; its error is that of the
    binary method used.

    References
    ----------
    Blanc, A. (1908). *J. Phys. Theor. Appl.* 7, 825-839.

    Examples
    --------
    >>> D = gas_diffusivity_in_mixture("water", {"nitrogen": 0.79, "oxygen": 0.21}, 300.0)
    >>> round(D * 1e6, 1)
    26.2

    """
    if not isinstance(carrier, Mapping) or not carrier:
        raise InputValueError(
            f"carrier={carrier!r} must be a non-empty mapping of species to mole fraction, "
            "e.g. {'nitrogen': 0.79, 'oxygen': 0.21}"
        )
    names = list(carrier)
    y = [float(carrier[n]) for n in names]  # type: ignore[index]
    Ds = [np.asarray(gas_diffusivity(solute, n, T, P, method)) for n in names]
    stacked = np.stack(np.broadcast_arrays(*Ds), axis=-1)
    return blanc(stacked, y)
