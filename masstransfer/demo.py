"""The demo report: an invented drying scenario, computed end to end."""

from __future__ import annotations

import textwrap

import numpy as np

from .diffusivity._gas import gas_diffusivity
from .diffusivity._liquid import liquid_diffusivity
from .substances._properties import liquid_model
from .surface._analogy import mass_transfer_from_heat
from .surface._flux import high_flux_rate
from .surface._wet_surface import wet_surface_temperature

__all__ = ["demo_report"]

_SCENARIO = (
    "Scenario (invented for this demo): a gas-fired tunnel kiln pre-dries glazed\n"
    "stoneware. Moisture leaves the ware as water vapour into the kiln air, which\n"
    "is heated from 40 C at the entry to 180 C at the end of the drying zone, at\n"
    "101.325 kPa. The glaze binder is an ethanol-based medium, so ethanol vapour\n"
    "leaves too. Which diffusivities should the drying model use along the zone?"
)

#: Water vapour in air at 101.325 kPa, measured: CRC Handbook of Chemistry and Physics, table
#: "Diffusion in gases" (after Marrero & Mason 1972, J. Phys. Chem. Ref. Data 1, 3) [K, m^2/s].
_WATER_AIR_MEASURED = ((293.15, 0.242e-4), (373.15, 0.399e-4))
_WATER_AIR_SOURCE = "CRC Handbook, 'Diffusion in gases', after Marrero & Mason 1972"


def _caution() -> str:
    """Return the closing cautions, with each method's published average error from its record."""
    from .diffusivity import GAS_METHODS, LIQUID_METHODS

    errors = ", ".join(
        f"{title} about {record.accuracy_pct:g} %"
        for title, record in (
            ("Fuller", GAS_METHODS["fuller"]),
            ("Brokaw", GAS_METHODS["brokaw"]),
            ("Wilke-Lee", GAS_METHODS["wilke-lee"]),
            ("Hayduk-Minhas", LIQUID_METHODS["hayduk-minhas"]),
        )
    )
    return textwrap.fill(
        f"Cautions: these are estimates from published correlations (average absolute errors: {errors}; "
        "the drying rate inherits the error of h). Ethanol vapour is flammable: kiln ventilation and "
        "any design that affects safety must rest on measured data, local codes and licensed "
        "engineering practice.",
        width=80,
    )


def _measured_water(P: float) -> list[str]:
    """Compare both water-vapour methods with measured values, so the reader sees which is closer."""
    T = np.array([t for t, _ in _WATER_AIR_MEASURED])
    measured = np.array([d for _, d in _WATER_AIR_MEASURED])
    lines = [
        "Measured, water vapour in air, mm^2/s: "
        + ", ".join(f"{m * 1e6:.1f} at {t - 273.15:.0f} C" for t, m in _WATER_AIR_MEASURED),
        f"({_WATER_AIR_SOURCE}); the methods deviate by",
    ]
    mean_dev = {}
    for method, title in (("fuller", "Fuller"), ("brokaw", "Brokaw")):
        dev = 100.0 * (np.asarray(gas_diffusivity("water", "air", T, P, method=method)) / measured - 1.0)
        mean_dev[title] = float(np.mean(np.abs(dev)))
        lines.append(
            f"  {title + ':':<8}"
            + ", ".join(f"{d:+.0f} % at {t - 273.15:.0f} C" for t, d in zip(T, dev, strict=True))
        )
    closer = min(mean_dev, key=mean_dev.__getitem__)
    lines.append(f"{closer} is the closer on these data; where it matters, use a measured value.")
    return lines


def _drying_chain() -> list[str]:
    """Walk the chain from a known h to a drying rate, for the invented kiln."""
    T_air = 273.15 + 90.0  # K, kiln air in the constant-rate zone (invented)
    y_air = 0.05  # water-vapour mole fraction of the kiln air (invented)
    P = 101325.0
    h = 22.0  # W/(m^2 K), the kiln maker's figure for the ware surface (invented)
    area = 40.0  # m^2 of wet ware surface per charge (invented)
    T_s = float(wet_surface_temperature("water", "air", T_air, y_air, P))
    T_film = 0.5 * (T_air + T_s)
    coeff = mass_transfer_from_heat(h, "water", "air", T_film, P)
    assert coeff.k_y is not None
    y_s = float(liquid_model("water").vapor_pressure(T_s)) / P
    N = float(high_flux_rate(coeff.k_y, y_s, y_air))  # mol/(m^2 s), stagnant air
    N_low = float(coeff.k_y) * (y_s - y_air)
    m_flux = N * 0.01801528  # kg/(m^2 s)
    return [
        "",
        "From a known heat-transfer coefficient to the drying rate (constant-rate period)",
        "-" * 78,
        f"  kiln air (invented)        T = {T_air - 273.15:.1f} C, water mole fraction {y_air:.3f}, "
        f"{P / 1000:.3f} kPa",
        f"  h at the ware (invented)   {h:.1f} W/(m^2 K); wet ware area {area:.0f} m^2 per charge",
        f"  wet-surface temperature    {T_s - 273.15:.2f} C (energy balance, Ackermann-corrected)",
        f"  film properties at         {T_film - 273.15:.2f} C: Pr {float(coeff.Pr):.3f}, "
        f"Sc {float(coeff.Sc):.3f}, Le {float(coeff.Le):.3f}",
        f"  Chilton-Colburn            k_c = {float(coeff.k_c):.4f} m/s, "
        f"k_y = {float(coeff.k_y):.3f} mol/(m^2 s)",
        f"  surface vapour fraction    {y_s:.4f}",
        f"  evaporation flux           {N * 1000:.2f} mmol/(m^2 s) = {m_flux * 3600:.3f} kg/(m^2 h)"
        f"  (low-flux estimate {N_low / N:.3f} x this)",
        f"  charge drying rate         {m_flux * area * 3600:.1f} kg of water per hour",
    ]


def _falling_rate() -> list[str]:
    """Walk the falling-rate period: moisture diffusing out of the ware body."""
    from .bodies._transient import fractional_release, half_time

    D = 5e-10  # m^2/s, effective moisture diffusivity of the clay body (invented)
    half = 4e-3  # m, half-thickness of an 8 mm ware wall dried from both faces (invented)
    t_h = np.array([1.0, 2.0, 4.0, 8.0, 16.0])
    released = np.asarray(fractional_release("slab", t_h * 3600.0, D, half))
    lines = [
        "",
        "Falling-rate period: moisture diffusing out of the ware body",
        "-" * 78,
        f"  effective D in the body (invented) {D:.1e} m^2/s; 8 mm wall, dried from both faces",
        f"  half of the removable moisture is gone after {float(half_time('slab', D, half)) / 3600:.2f} h",
        "  time [h]   " + "  ".join(f"{t:5.1f}" for t in t_h),
        "  released   " + "  ".join(f"{r:5.3f}" for r in released),
    ]
    return lines


def demo_report() -> str:
    """Return the demo report as text.

    Returns
    -------
    str
        A short report with units: water-vapour and ethanol diffusivities in
        air along an invented kiln's drying zone, by two methods side by side.

    References
    ----------
    The methods' references are in the docstrings of the functions the
    report calls (gas_diffusivity, mass_transfer_from_heat, fractional_release).

    Examples
    --------
    >>> "Fuller" in demo_report()
    True

    """
    T_c = np.array([40.0, 70.0, 100.0, 130.0, 160.0, 180.0])  # drying-zone temperatures (invented)
    T = T_c + 273.15
    P = 101325.0
    w_f = np.asarray(gas_diffusivity("water", "air", T, P, method="fuller"))
    w_ce = np.asarray(gas_diffusivity("water", "air", T, P, method="brokaw"))
    e_f = np.asarray(gas_diffusivity("ethanol", "air", T, P, method="fuller"))
    e_wl = np.asarray(gas_diffusivity("ethanol", "air", T, P, method="wilke-lee"))
    lines = [
        "masstransfer demo: diffusivities along a kiln drying zone",
        "=" * 58,
        _SCENARIO,
        "",
        "Binary diffusivity in air at 101.325 kPa, mm^2/s (1 mm^2/s = 1e-6 m^2/s)",
        "",
        f"{'T':>7} {'T':>8} | {'water vapour':^23} | {'ethanol vapour':^23}",
        f"{'[C]':>7} {'[K]':>8} | {'Fuller':>7} {'Brokaw':>9} {'diff':>5} "
        f"| {'Fuller':>7} {'Wilke-Lee':>9} {'diff':>5}",
        "-" * 66,
    ]
    for i in range(T.size):
        dw = 100.0 * (w_ce[i] / w_f[i] - 1.0)
        de = 100.0 * (e_wl[i] / e_f[i] - 1.0)
        lines.append(
            f"{T_c[i]:7.1f} {T[i]:8.2f} | {w_f[i] * 1e6:7.2f} {w_ce[i] * 1e6:9.2f} {dw:+4.0f}% "
            f"| {e_f[i] * 1e6:7.2f} {e_wl[i] * 1e6:9.2f} {de:+4.0f}%"
        )
    lines += [
        "",
        "diff: second method relative to Fuller, a spread of the size of the methods'",
        "published errors.",
        *_measured_water(P),
        "",
        "For comparison, ethanol dissolved in the glaze water at 40 C (Hayduk-Minhas):",
        f"  D = {liquid_diffusivity('ethanol', 'water', 313.15) * 1e9:.2f}e-9 m^2/s, "
        "about four orders of magnitude below the gas values.",
        *_drying_chain(),
        *_falling_rate(),
        "",
        _caution(),
    ]
    return "\n".join(lines)
