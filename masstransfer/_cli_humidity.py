"""The ``evaporate`` subcommand: evaporation from a wet surface into a gas, in one call."""

from __future__ import annotations

import argparse
import json
from typing import Any

import numpy as np

__all__ = ["register", "run"]

_HUMIDITY = {
    "rh": "relative_humidity",
    "y": "y",
    "humidity_ratio": "humidity_ratio",
    "dew_point": "dew_point",
}


def register(sub: Any) -> None:
    """Add the ``evaporate`` subcommand to the command line's subparsers."""
    e = sub.add_parser(
        "evaporate",
        help="evaporation rate of a liquid from a wet surface into a gas (the constant-rate period)",
        description=(
            "Surface temperature, mass-transfer coefficients, evaporation flux and heat split for "
            "LIQUID evaporating from a wet surface into GAS. Give exactly one humidity measure, "
            "and either --h or --correlation with --velocity and --length."
        ),
    )
    e.add_argument("liquid", help="evaporating liquid: name, CAS number or formula")
    e.add_argument("gas", help="dry gas, e.g. air or nitrogen")
    e.add_argument(
        "-T",
        "--temperature",
        type=float,
        nargs="+",
        required=True,
        metavar="K",
        help="gas temperature(s) in K",
    )
    e.add_argument("-P", "--pressure", type=float, default=101325.0, metavar="PA", help="pressure in Pa")
    hum = e.add_mutually_exclusive_group(required=True)
    hum.add_argument("--rh", type=float, help="relative humidity of the gas as a fraction (0-1)")
    hum.add_argument("--y", type=float, help="vapour mole fraction in the gas")
    hum.add_argument("--humidity-ratio", type=float, metavar="KG/KG", help="kg vapour per kg dry gas")
    hum.add_argument("--dew-point", type=float, metavar="K", help="dew point of the gas in K")
    how = e.add_mutually_exclusive_group(required=True)
    how.add_argument("--h", type=float, metavar="W/(m2 K)", help="known heat-transfer coefficient")
    how.add_argument("--correlation", metavar="SLUG", help="forced-convection record (see 'correlations')")
    e.add_argument("--velocity", type=float, metavar="M/S", help="gas velocity for --correlation")
    e.add_argument("--length", type=float, metavar="M", help="characteristic length for --correlation")
    e.add_argument(
        "--radiant-temperature", type=float, metavar="K", help="temperature of radiating surroundings"
    )
    e.add_argument(
        "--emissivity",
        type=float,
        default=None,
        help=(
            "emissivity of the wet surface (default 0.9); it has no effect unless "
            "--radiant-temperature is given"
        ),
    )
    e.add_argument(
        "--conduction-coefficient",
        type=float,
        default=0.0,
        metavar="W/(m2 K)",
        help="coefficient from a heated support to the surface (default 0)",
    )
    e.add_argument("--json", action="store_true", help="print JSON instead of a table")


def run(args: argparse.Namespace) -> str:
    """Compute and format the ``evaporate`` subcommand's output."""
    from ._cli_text import caution, caution_line, pressure
    from .errors import InputTypeError
    from .humidity._evaporation import FLAMMABLE_VAPOUR, evaporation_rate

    if args.correlation is not None and (args.velocity is None or args.length is None):
        raise InputTypeError("--correlation needs --velocity (m/s) and --length (m)")
    T = np.asarray(args.temperature, dtype=float)
    humidity = {key: getattr(args, opt) for opt, key in _HUMIDITY.items() if getattr(args, opt) is not None}
    r = evaporation_rate(
        args.liquid,
        args.gas,
        T=T,
        h=args.h,
        P=args.pressure,
        correlation=args.correlation,
        velocity=args.velocity,
        L=args.length,
        radiant_temperature=args.radiant_temperature,
        emissivity=0.9 if args.emissivity is None else args.emissivity,
        conduction_coefficient=args.conduction_coefficient,
        **humidity,
    )
    fields: dict[str, Any] = {
        "T_K": r.T,
        "T_surface_K": r.T_surface,
        "humidity_ratio_kg_per_kg": r.humidity_ratio,
        "h_W_per_m2K": r.h,
        "k_c_m_per_s": r.k_c,
        "k_y_mol_per_m2s": r.k_y,
        "k_G_mol_per_m2sPa": r.k_G,
        "molar_flux_mol_per_m2s": r.molar_flux,
        "mass_flux_kg_per_m2s": r.mass_flux,
        "mass_flux_kg_per_m2h": r.mass_flux_per_hour,
        "q_convective_W_per_m2": r.q_convective,
        "q_radiant_W_per_m2": r.q_radiant,
        "q_conducted_W_per_m2": r.q_conducted,
        "q_latent_W_per_m2": r.q_latent,
    }
    unused = []
    if args.emissivity is not None and args.radiant_temperature is None:
        unused.append(
            "--emissivity has no effect without --radiant-temperature (no radiant heat was counted)"
        )
    cols = {k: np.broadcast_to(np.atleast_1d(np.asarray(v, dtype=float)), T.shape) for k, v in fields.items()}
    if args.json:
        return json.dumps(
            {
                "liquid": r.liquid_identity,
                "gas": r.gas_identity,
                "P_Pa": args.pressure,
                "method": r.method,
                "caution": caution(FLAMMABLE_VAPOUR),
                "warnings": [*r.warnings, *unused],
                **{k: v.tolist() for k, v in cols.items()},
            },
            indent=2,
        )
    from .cli import _table

    header = ["T [K]", "T_s [K]", "h [W/(m^2 K)]", "k_c [m/s]", "N [mol/(m^2 s)]", "flux [kg/(m^2 h)]"]
    keys = [
        "T_K",
        "T_surface_K",
        "h_W_per_m2K",
        "k_c_m_per_s",
        "molar_flux_mol_per_m2s",
        "mass_flux_kg_per_m2h",
    ]
    header += ["q_conv [W/m^2]", "q_rad [W/m^2]", "q_cond [W/m^2]"]
    keys += ["q_convective_W_per_m2", "q_radiant_W_per_m2", "q_conducted_W_per_m2"]
    fmt = {
        "T_K": "{:.2f}",
        "T_surface_K": "{:.2f}",
        "h_W_per_m2K": "{:.4g}",
        "mass_flux_kg_per_m2h": "{:.4g}",
    }
    rows = [[fmt.get(k, "{:.4g}").format(cols[k][i]) for k in keys] for i in range(T.size)]
    foot = f"{r.method}.\nConstant-rate period: the surface is freely wet; the rate inherits the error of h."
    if r.warnings or unused:
        foot += "\nWarnings:\n  " + "\n  ".join([*r.warnings, *unused])
    foot += "\n" + caution_line(FLAMMABLE_VAPOUR)
    identities = f"liquid: {r.liquid_identity}\ngas: {r.gas_identity}\n"  # above the table, as elsewhere
    return identities + _table(
        f"Evaporation of {r.liquid} into {r.gas} at {pressure(args.pressure)}", header, rows, foot
    )
