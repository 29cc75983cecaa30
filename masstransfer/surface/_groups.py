"""Dimensionless groups of heat and mass transfer.

Where ``fluids.core`` already defines a group, it is used (after our argument
checks) rather than written again; our names are PEP 8.  Every function
accepts floats or arrays and returns a float for scalar input.

``fluids`` is imported on the first call, so ``import masstransfer`` stays light.
"""

from __future__ import annotations

from types import ModuleType
from typing import Any

import numpy as np

from .._typing import ArrayLike, FloatOrArray
from .._validation import as_float, check_positive, check_shapes, finish, guard
from ..constants import GRAVITY

__all__ = [
    "archimedes",
    "biot_heat",
    "biot_mass",
    "colburn_j_heat",
    "colburn_j_mass",
    "fourier_heat",
    "fourier_mass",
    "graetz",
    "grashof_solutal",
    "grashof_thermal",
    "lewis",
    "nusselt",
    "peclet_heat",
    "peclet_mass",
    "prandtl",
    "rayleigh",
    "reynolds",
    "schmidt",
    "sherwood",
    "stanton_heat",
    "stanton_mass",
]


_FLUIDS_CORE: ModuleType | None = None


def _fc() -> Any:
    global _FLUIDS_CORE
    if _FLUIDS_CORE is None:
        import fluids.core

        _FLUIDS_CORE = fluids.core
    return _FLUIDS_CORE


def _pos(**kw: ArrayLike) -> dict[str, FloatOrArray]:
    out = {k: check_positive(k, v) for k, v in kw.items()}
    check_shapes(**out)
    return out


@guard
def reynolds(V: ArrayLike, L: ArrayLike, nu: ArrayLike) -> FloatOrArray:
    r"""Reynolds number :math:`Re = VL/\nu`.

    Parameters
    ----------
    V : float or array_like
        Velocity [m/s].
    L : float or array_like
        Characteristic length [m].
    nu : float or array_like
        Kinematic viscosity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Reynolds number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Reynolds). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(reynolds(2.0, 0.05, 1.5e-5))
    6667

    """
    a = _pos(V=V, L=L, nu=nu)
    return finish(_fc().Reynolds(a["V"], a["L"], nu=a["nu"]))


@guard
def prandtl(cp: ArrayLike, k: ArrayLike, mu: ArrayLike) -> FloatOrArray:
    r"""Prandtl number :math:`Pr = c_p\mu/k`.

    Parameters
    ----------
    cp : float or array_like
        Specific heat capacity [J/(kg K)].
    k : float or array_like
        Thermal conductivity [W/(m K)].
    mu : float or array_like
        Dynamic viscosity [Pa s].

    Returns
    -------
    float or numpy.ndarray
        Prandtl number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Prandtl). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(prandtl(1007.0, 0.0263, 1.846e-5), 3)
    0.707

    """
    a = _pos(cp=cp, k=k, mu=mu)
    return finish(_fc().Prandtl(Cp=a["cp"], k=a["k"], mu=a["mu"]))


@guard
def schmidt(D: ArrayLike, nu: ArrayLike) -> FloatOrArray:
    r"""Schmidt number :math:`Sc = \nu/D`.

    Parameters
    ----------
    D : float or array_like
        Diffusivity of the transferring species [m^2/s].
    nu : float or array_like
        Kinematic viscosity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Schmidt number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Schmidt). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(schmidt(2.6e-5, 1.57e-5), 3)
    0.604

    """
    a = _pos(D=D, nu=nu)
    return finish(_fc().Schmidt(a["D"], nu=a["nu"]))


@guard
def lewis(alpha: ArrayLike, D: ArrayLike) -> FloatOrArray:
    r"""Lewis number :math:`Le = \alpha/D = Sc/Pr`.

    Parameters
    ----------
    alpha : float or array_like
        Thermal diffusivity [m^2/s].
    D : float or array_like
        Mass diffusivity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Lewis number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Lewis). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(lewis(2.2e-5, 2.6e-5), 3)
    0.846

    """
    a = _pos(alpha=alpha, D=D)
    return finish(_fc().Lewis(a["D"], alpha=a["alpha"]))


@guard
def nusselt(h: ArrayLike, L: ArrayLike, k: ArrayLike) -> FloatOrArray:
    """Nusselt number :math:`Nu = hL/k`.

    Parameters
    ----------
    h : float or array_like
        Heat-transfer coefficient [W/(m^2 K)].
    L : float or array_like
        Characteristic length [m].
    k : float or array_like
        Thermal conductivity of the fluid [W/(m K)].

    Returns
    -------
    float or numpy.ndarray
        Nusselt number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Nusselt). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(nusselt(25.0, 0.1, 0.026), 1)
    96.2

    """
    a = _pos(h=h, L=L, k=k)
    return finish(_fc().Nusselt(a["h"], a["L"], a["k"]))


@guard
def sherwood(k_c: ArrayLike, L: ArrayLike, D: ArrayLike) -> FloatOrArray:
    """Sherwood number :math:`Sh = k_cL/D`.

    Parameters
    ----------
    k_c : float or array_like
        Mass-transfer coefficient [m/s].
    L : float or array_like
        Characteristic length [m].
    D : float or array_like
        Diffusivity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Sherwood number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Sherwood). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(sherwood(0.02, 0.1, 2.6e-5), 1)
    76.9

    """
    a = _pos(k_c=k_c, L=L, D=D)
    return finish(_fc().Sherwood(a["k_c"], a["L"], a["D"]))


@guard
def stanton_heat(h: ArrayLike, V: ArrayLike, rho: ArrayLike, cp: ArrayLike) -> FloatOrArray:
    r"""Heat-transfer Stanton number :math:`St = h/(\rho c_p V)`.

    Parameters
    ----------
    h : float or array_like
        Heat-transfer coefficient [W/(m^2 K)].
    V : float or array_like
        Velocity [m/s].
    rho : float or array_like
        Density [kg/m^3].
    cp : float or array_like
        Specific heat capacity [J/(kg K)].

    Returns
    -------
    float or numpy.ndarray
        Stanton number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Stanton). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(stanton_heat(25.0, 5.0, 1.2, 1007.0), 5)
    0.00414

    """
    a = _pos(h=h, V=V, rho=rho, cp=cp)
    return finish(_fc().Stanton(a["h"], a["V"], a["rho"], a["cp"]))


@guard
def stanton_mass(k_c: ArrayLike, V: ArrayLike) -> FloatOrArray:
    """Mass-transfer Stanton number :math:`St_m = k_c/V`.

    Parameters
    ----------
    k_c : float or array_like
        Mass-transfer coefficient [m/s].
    V : float or array_like
        Velocity [m/s].

    Returns
    -------
    float or numpy.ndarray
        Mass-transfer Stanton number [-].

    References
    ----------
    Incropera, F. P., DeWitt, D. P. et al. (2007). *Fundamentals of Heat and
    Mass Transfer*, 6th ed., Wiley, Eq. (6.69).

    Examples
    --------
    >>> stanton_mass(0.02, 5.0)
    0.004

    """
    a = _pos(k_c=k_c, V=V)
    return finish(a["k_c"] / a["V"])


@guard
def colburn_j_heat(St: ArrayLike, Pr: ArrayLike) -> FloatOrArray:
    r"""Colburn j-factor for heat transfer :math:`j_H = St\,Pr^{2/3}`.

    Parameters
    ----------
    St : float or array_like
        Stanton number [-].
    Pr : float or array_like
        Prandtl number [-].

    Returns
    -------
    float or numpy.ndarray
        j_H [-].

    References
    ----------
    Colburn, A. P. (1933). A method of correlating forced convection heat
    transfer data. *Trans. AIChE* 29, 174-210.

    Examples
    --------
    >>> round(colburn_j_heat(0.004, 0.71), 5)
    0.00318

    """
    a = _pos(St=St, Pr=Pr)
    return finish(a["St"] * a["Pr"] ** (2.0 / 3.0))


@guard
def colburn_j_mass(St_m: ArrayLike, Sc: ArrayLike) -> FloatOrArray:
    r"""Colburn j-factor for mass transfer :math:`j_D = St_m\,Sc^{2/3}`.

    Parameters
    ----------
    St_m : float or array_like
        Mass-transfer Stanton number [-].
    Sc : float or array_like
        Schmidt number [-].

    Returns
    -------
    float or numpy.ndarray
        j_D [-].

    References
    ----------
    Chilton, T. H., & Colburn, A. P. (1934). Mass transfer (absorption)
    coefficients. *Ind. Eng. Chem.* 26, 1183-1187.
    https://doi.org/10.1021/ie50299a012

    Examples
    --------
    >>> round(colburn_j_mass(0.004, 0.6), 5)
    0.00285

    """
    a = _pos(St_m=St_m, Sc=Sc)
    return finish(a["St_m"] * a["Sc"] ** (2.0 / 3.0))


@guard
def peclet_heat(V: ArrayLike, L: ArrayLike, alpha: ArrayLike) -> FloatOrArray:
    r"""Heat-transfer Peclet number :math:`Pe = VL/\alpha = Re\,Pr`.

    Parameters
    ----------
    V : float or array_like
        Velocity [m/s].
    L : float or array_like
        Characteristic length [m].
    alpha : float or array_like
        Thermal diffusivity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Peclet number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Peclet_heat). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(peclet_heat(1.0, 0.01, 2.2e-5))
    455

    """
    a = _pos(V=V, L=L, alpha=alpha)
    return finish(_fc().Peclet_heat(a["V"], a["L"], alpha=a["alpha"]))


@guard
def peclet_mass(V: ArrayLike, L: ArrayLike, D: ArrayLike) -> FloatOrArray:
    r"""Mass-transfer Peclet number :math:`Pe_m = VL/D = Re\,Sc`.

    Parameters
    ----------
    V : float or array_like
        Velocity [m/s].
    L : float or array_like
        Characteristic length [m].
    D : float or array_like
        Diffusivity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Peclet number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Peclet_mass). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(peclet_mass(1.0, 0.01, 2.6e-5))
    385

    """
    a = _pos(V=V, L=L, D=D)
    return finish(_fc().Peclet_mass(a["V"], a["L"], a["D"]))


@guard
def grashof_thermal(
    L: ArrayLike, beta: ArrayLike, dT: ArrayLike, nu: ArrayLike, g: float = GRAVITY
) -> FloatOrArray:
    r"""Thermal Grashof number :math:`Gr = g\beta|\Delta T|L^3/\nu^2`.

    Parameters
    ----------
    L : float or array_like
        Characteristic length [m].
    beta : float or array_like
        Volumetric thermal expansion coefficient [1/K] (1/T for an ideal gas).
    dT : float or array_like
        Surface-to-fluid temperature difference [K]; its magnitude is used.
    nu : float or array_like
        Kinematic viscosity [m^2/s].
    g : float
        Gravitational acceleration [m/s^2].

    Returns
    -------
    float or numpy.ndarray
        Grashof number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Grashof). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(grashof_thermal(0.5, 1 / 300.0, 20.0, 1.6e-5) / 1e8, 3)
    3.192

    """
    a = _pos(L=L, beta=beta, nu=nu, g=g)
    d = check_positive("dT", abs(as_float("dT", dT)), "pass a non-zero, finite temperature difference")
    check_shapes(L=a["L"], beta=a["beta"], nu=a["nu"], dT=d)
    return finish(_fc().Grashof(a["L"], a["beta"], d, 0.0, nu=a["nu"], g=a["g"]))


@guard
def grashof_solutal(
    L: ArrayLike, rho_surface: ArrayLike, rho_bulk: ArrayLike, nu: ArrayLike, g: float = GRAVITY
) -> FloatOrArray:
    r"""Grashof number from a density difference :math:`Gr = g|\Delta\rho|L^3/(\bar\rho\nu^2)`.

    Because it takes the density difference itself, it covers solutal,
    thermal and combined buoyancy alike: pass the densities of the fluid at
    the surface state (temperature and composition) and in the bulk.

    Parameters
    ----------
    L : float or array_like
        Characteristic length [m].
    rho_surface : float or array_like
        Fluid density at the surface conditions [kg/m^3].
    rho_bulk : float or array_like
        Fluid density in the bulk [kg/m^3].
    nu : float or array_like
        Kinematic viscosity [m^2/s].
    g : float
        Gravitational acceleration [m/s^2].

    Returns
    -------
    float or numpy.ndarray
        Grashof number [-].

    Notes
    -----
    The mean of the two densities is the reference density.  Combined
    buoyancy aids when both effects make the surface fluid lighter (or both
    heavier); the density difference accounts for that automatically.

    References
    ----------
    Bird, R. B., Stewart, W. E., & Lightfoot, E. N. (2002). *Transport
    Phenomena*, 2nd ed., Wiley, Section 19.5 and Table 22.2-1.

    Examples
    --------
    >>> round(grashof_solutal(0.1, 1.15, 1.18, 1.6e-5) / 1e6, 3)
    0.986

    """
    a = _pos(L=L, rho_surface=rho_surface, rho_bulk=rho_bulk, nu=nu, g=g)
    rs, rb = np.asarray(a["rho_surface"]), np.asarray(a["rho_bulk"])
    return finish(a["g"] * np.abs(rs - rb) / (0.5 * (rs + rb)) * a["L"] ** 3 / a["nu"] ** 2)


@guard
def rayleigh(Gr: ArrayLike, Pr: ArrayLike) -> FloatOrArray:
    r"""Rayleigh number :math:`Ra = Gr\,Pr` (or :math:`Gr\,Sc` for mass transfer).

    Parameters
    ----------
    Gr : float or array_like
        Grashof number [-].
    Pr : float or array_like
        Prandtl number, or Schmidt number for mass transfer [-].

    Returns
    -------
    float or numpy.ndarray
        Rayleigh number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Rayleigh). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> rayleigh(1e8, 0.7)
    70000000.0

    """
    a = _pos(Gr=Gr, Pr=Pr)
    return finish(_fc().Rayleigh(a["Pr"], a["Gr"]))


@guard
def biot_heat(h: ArrayLike, L: ArrayLike, k_solid: ArrayLike) -> FloatOrArray:
    """Heat-transfer Biot number :math:`Bi = hL/k_s`.

    Parameters
    ----------
    h : float or array_like
        Heat-transfer coefficient [W/(m^2 K)].
    L : float or array_like
        Characteristic length of the solid [m].
    k_solid : float or array_like
        Thermal conductivity of the solid [W/(m K)].

    Returns
    -------
    float or numpy.ndarray
        Biot number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Biot). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> biot_heat(50.0, 0.01, 1.0)
    0.5

    """
    a = _pos(h=h, L=L, k_solid=k_solid)
    return finish(_fc().Biot(a["h"], a["L"], a["k_solid"]))


@guard
def biot_mass(k_c: ArrayLike, L: ArrayLike, D_solid: ArrayLike, partition: ArrayLike = 1.0) -> FloatOrArray:
    """Mass-transfer Biot number :math:`Bi_m = k_cL/(K D_s)`.

    Parameters
    ----------
    k_c : float or array_like
        External (fluid-side) mass-transfer coefficient [m/s].
    L : float or array_like
        Characteristic length of the solid [m].
    D_solid : float or array_like
        Diffusivity inside the solid [m^2/s].
    partition : float or array_like
        Partition coefficient K = c_solid/c_fluid at equilibrium [-].

    Returns
    -------
    float or numpy.ndarray
        Mass Biot number [-].

    Notes
    -----
    With a partition coefficient the fluid-side concentration is expressed
    on the solid's scale; K = 1 recovers the usual form.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Oxford,
    Section 4.3.

    Examples
    --------
    >>> round(biot_mass(1e-4, 0.002, 1e-10), 1)
    2000.0

    """
    a = _pos(k_c=k_c, L=L, D_solid=D_solid, partition=partition)
    return finish(a["k_c"] * a["L"] / (a["partition"] * a["D_solid"]))


@guard
def fourier_heat(t: ArrayLike, L: ArrayLike, alpha: ArrayLike) -> FloatOrArray:
    r"""Heat-transfer Fourier number :math:`Fo = \alpha t/L^2`.

    Parameters
    ----------
    t : float or array_like
        Time [s].
    L : float or array_like
        Characteristic length [m].
    alpha : float or array_like
        Thermal diffusivity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Fourier number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Fourier_heat). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> fourier_heat(100.0, 0.01, 1e-7)
    0.1

    """
    a = _pos(t=t, L=L, alpha=alpha)
    return finish(_fc().Fourier_heat(a["t"], a["L"], alpha=a["alpha"]))


@guard
def fourier_mass(t: ArrayLike, L: ArrayLike, D: ArrayLike) -> FloatOrArray:
    """Mass-transfer Fourier number :math:`Fo_m = Dt/L^2`.

    Parameters
    ----------
    t : float or array_like
        Time [s].
    L : float or array_like
        Characteristic length [m].
    D : float or array_like
        Diffusivity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Fourier number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Fourier_mass). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(fourier_mass(3600.0, 0.001, 1e-11), 4)
    0.036

    """
    a = _pos(t=t, L=L, D=D)
    return finish(_fc().Fourier_mass(a["t"], a["L"], a["D"]))


@guard
def graetz(Re: ArrayLike, Pr: ArrayLike, diameter: ArrayLike, x: ArrayLike) -> FloatOrArray:
    r"""Graetz number :math:`Gz = (d/x)\,Re\,Pr` (use Sc for mass transfer).

    Parameters
    ----------
    Re : float or array_like
        Reynolds number on the duct diameter [-].
    Pr : float or array_like
        Prandtl number (Schmidt number for mass transfer) [-].
    diameter : float or array_like
        Duct (hydraulic) diameter d [m].
    x : float or array_like
        Distance from the start of the transfer section, or its length [m].

    Returns
    -------
    float or numpy.ndarray
        Graetz number [-].

    References
    ----------
    Incropera, F. P., DeWitt, D. P. et al. (2007). *Fundamentals of Heat and
    Mass Transfer*, 6th ed., Wiley, Eq. (8.56).

    Examples
    --------
    >>> graetz(1000.0, 5.0, 0.01, 1.0)
    50.0

    """
    a = _pos(Re=Re, Pr=Pr, diameter=diameter, x=x)
    return finish(a["diameter"] / a["x"] * a["Re"] * a["Pr"])


@guard
def archimedes(
    d: ArrayLike, rho_fluid: ArrayLike, rho_particle: ArrayLike, mu: ArrayLike, g: float = GRAVITY
) -> FloatOrArray:
    r"""Archimedes number :math:`Ar = g d^3\rho_f|\rho_p-\rho_f|/\mu^2`.

    Parameters
    ----------
    d : float or array_like
        Particle, drop or bubble diameter [m].
    rho_fluid : float or array_like
        Density of the continuous fluid [kg/m^3].
    rho_particle : float or array_like
        Density of the particle, drop or bubble [kg/m^3].
    mu : float or array_like
        Viscosity of the continuous fluid [Pa s].
    g : float
        Gravitational acceleration [m/s^2].

    Returns
    -------
    float or numpy.ndarray
        Archimedes number [-].

    References
    ----------
    Bell, C. fluids (fluids.core.Archimedes). https://github.com/CalebBell/fluids

    Examples
    --------
    >>> round(archimedes(0.002, 998.0, 1.2, 1.0e-3))
    78046

    """
    a = _pos(d=d, rho_fluid=rho_fluid, rho_particle=rho_particle, mu=mu, g=g)
    rf, rp = np.asarray(a["rho_fluid"]), np.asarray(a["rho_particle"])
    return finish(a["g"] * a["d"] ** 3 * rf * np.abs(rp - rf) / a["mu"] ** 2)
