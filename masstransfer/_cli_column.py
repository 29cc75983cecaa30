"""The ``column`` subcommand: rate or size a packed absorber from a small TOML spec file.

The spec states every unit in its keys (``diameter_m``, ``flow_mol_per_s``, ``T_K``).  The
packing's film coefficients come from :func:`masstransfer.contactors.rate_packing`, the
equilibrium slope from the spec or from Henry's constant, and the height or the outlet from
:func:`masstransfer.contactors.column_profile`.
"""

from __future__ import annotations

import argparse
import json
import math
import sys
from collections.abc import Mapping
from typing import Any

from ._cli_text import caution
from .errors import InputTypeError, InputValueError

__all__ = ["CAUTION", "EXAMPLE_SPEC", "register", "run"]

#: The film coefficients' error, then the usual caution.
CAUTION = caution(
    "The film coefficients carry the stated error of their correlations (about 10-30 %), the "
    "properties and equilibrium their own; a scrubber for toxic or flammable gases needs measured "
    "data for the actual packing and system."
)

#: A complete spec (an invented scrubber), printed by ``masstransfer column --example``.
EXAMPLE_SPEC = """\
# Invented example: ammonia scrubbed from air with water in 50 mm metal Pall rings.
[column]
mode = "size"                 # "size" (for gas.y_out) or "rate" (for column.height_m)
diameter_m = 0.6
packing = "pall-ring-metal-50"
method = "billet-schultes"    # or "onda", "bravo-rocha-fair"
# height_m = 3.0              # needed for mode = "rate"

[gas]
medium = "air"
solute = "ammonia"
flow_mol_per_s = 12.0
y_in = 0.02
y_out = 0.0005                # needed for mode = "size"
T_K = 298.15
P_Pa = 101325.0

[liquid]
medium = "water"
flow_mol_per_s = 60.0
x_in = 0.0
T_K = 298.15

[equilibrium]
m = 0.95                      # y* = m x; leave out to use Henry's constant at T and P
heat_of_absorption_J_per_mol = 0.0
"""

_KEYS: Mapping[str, Mapping[str, str]] = {
    "column": {"mode": "str", "diameter_m": "float", "packing": "str", "method": "str", "height_m": "float"},
    "gas": {
        "medium": "str",
        "solute": "str",
        "flow_mol_per_s": "float",
        "y_in": "float",
        "y_out": "float",
        "T_K": "float",
        "P_Pa": "float",
    },
    "liquid": {"medium": "str", "flow_mol_per_s": "float", "x_in": "float", "T_K": "float"},
    "equilibrium": {"m": "float", "heat_of_absorption_J_per_mol": "float"},
}
_REQUIRED = {
    "column": ("diameter_m", "packing"),
    "gas": ("medium", "solute", "flow_mol_per_s", "y_in"),
    "liquid": ("medium", "flow_mol_per_s"),
}


def register(sub: Any) -> None:
    """Add the ``column`` subcommand to the command line's subparsers."""
    p: argparse.ArgumentParser = sub.add_parser(
        "column",
        help="rate or size a packed absorber from a TOML spec file",
        description=(
            "Rate (outlet for a height) or size (height for an outlet) a counter-current packed "
            "absorber described in a TOML file with the units in its keys. "
            "'masstransfer column --example' prints a complete spec."
        ),
    )
    p.add_argument("spec", nargs="?", help="TOML spec file")
    p.add_argument("--example", action="store_true", help="print an example spec and exit")
    p.add_argument("--points", type=int, default=11, help="heights in the printed profile (default 11)")
    p.add_argument("--json", action="store_true", help="print JSON instead of tables")


#: Above this fraction of the Billet & Schultes loading velocity the command refuses to rate the
#: column: flooding typically sets in at 1.3 to 1.5 times the loading point (common practice).
_FLOODING_FRACTION = 1.5


def _load(path: str) -> dict[str, Any]:
    if sys.version_info >= (3, 11):
        import tomllib
    else:  # pragma: no cover - exercised on Python 3.10
        import tomli as tomllib
    try:
        with open(path, "rb") as fh:
            data = tomllib.load(fh)
    except OSError as exc:
        raise InputValueError(f"spec={path!r} cannot be read ({exc.strerror}); pass a TOML file") from None
    except (tomllib.TOMLDecodeError, UnicodeDecodeError) as exc:
        raise InputValueError(f"spec={path!r} is not a valid UTF-8 TOML file ({exc})") from None
    return data


def _checked(data: Mapping[str, Any]) -> dict[str, dict[str, Any]]:
    out: dict[str, dict[str, Any]] = {}
    for table in data:
        if table not in _KEYS:
            raise InputValueError(f"spec table [{table}] is not known; accepted: {', '.join(_KEYS)}")
    for table, keys in _KEYS.items():
        given = data.get(table, {})
        if not isinstance(given, dict):
            raise InputTypeError(f"spec entry {table!r} must be a table [{table}]")
        for key, value in given.items():
            if key not in keys:
                raise InputValueError(
                    f"[{table}] {key} is not known; accepted keys (units in the names): {', '.join(keys)}"
                )
            want = keys[key]
            if want == "float" and (isinstance(value, bool) or not isinstance(value, int | float)):
                raise InputTypeError(f"[{table}] {key}={value!r} must be a number")
            if want == "str" and not isinstance(value, str):
                raise InputTypeError(f"[{table}] {key}={value!r} must be a string")
        for key in _REQUIRED.get(table, ()):
            if key not in given:
                raise InputValueError(f"[{table}] needs {key}")
        out[table] = dict(given)
    return out


def _compute(spec: Mapping[str, Mapping[str, Any]], points: int) -> dict[str, Any]:
    from .constants import R_GAS
    from .contactors import column_profile, rate_packing, transfer_units
    from .substances._properties import henry_constant, liquid_model
    from .substances._species import species

    col, gas, liq, eq = spec["column"], spec["gas"], spec["liquid"], spec["equilibrium"]
    mode = col.get("mode", "size")
    if mode not in ("size", "rate"):
        raise InputValueError(f"[column] mode={mode!r} must be 'size' or 'rate'")
    if mode == "size" and "y_out" not in gas:
        raise InputValueError("[gas] needs y_out for mode = 'size'")
    if mode == "rate" and "height_m" not in col:
        raise InputValueError("[column] needs height_m for mode = 'rate'")
    diameter = float(col["diameter_m"])
    if not diameter > 0:
        raise InputValueError(f"[column] diameter_m={diameter!r} must be positive")
    area = math.pi * diameter**2 / 4.0
    T_gas = float(gas.get("T_K", 298.15))
    P = float(gas.get("P_Pa", 101325.0))
    T_liq = float(liq.get("T_K", T_gas))
    G = float(gas["flow_mol_per_s"]) / area
    L = float(liq["flow_mol_per_s"]) / area
    liquid = liquid_model(liq["medium"])
    M_L = liquid.species.molar_mass
    rho_L = float(liquid.density(T_liq))
    u_V = G * R_GAS * T_gas / P
    u_L = L * M_L / rho_L
    method = col.get("method", "billet-schultes")
    film = rate_packing(
        gas["solute"], gas["medium"], liq["medium"], col["packing"], T_liq, u_V, u_L, P, method
    )
    if "m" in eq:
        m = float(eq["m"])
        m_source = "given in the spec"
    else:
        m = float(henry_constant(gas["solute"], liq["medium"], T_liq)) / P
        m_source = f"Henry's constant of {gas['solute']} in {liq['medium']} at {T_liq:g} K over P"
    c_L = rho_L / M_L
    k_y_a = float(film.k_G_a) * P
    k_x_a = float(film.k_L_a) * c_L
    K_y_a = 1.0 / (1.0 / k_y_a + m / k_x_a)
    dH = float(eq.get("heat_of_absorption_J_per_mol", 0.0))
    cp = float(liquid.heat_capacity(T_liq)) * M_L
    x_in = float(liq.get("x_in", 0.0))
    y_in = float(gas["y_in"])
    y_out = float(gas["y_out"]) if mode == "size" else None
    height = float(col["height_m"]) if mode == "rate" else None
    prof = column_profile(
        y_in,
        x_in,
        G,
        L,
        K_y_a,
        m,
        y_out,
        height,
        T_in=T_liq,
        heat_of_absorption=dH,
        cp_liquid=cp,
        points=points,
    )
    A = L / (m * G)
    N_OG = None
    if dH == 0.0:
        N_OG = float(transfer_units(y_in, prof.y_out, x_in, m, A))
    gas_resistance = (1.0 / k_y_a) / (1.0 / K_y_a)
    load = None if film.loading_fraction is None else float(film.loading_fraction)
    if load is not None and load > _FLOODING_FRACTION:
        raise InputValueError(
            f"the gas load is {100 * load:.0f} % of the packing's loading "
            f"point; above about {100 * _FLOODING_FRACTION:.0f} % a packed column floods (common "
            "practice) and no rating holds: enlarge diameter_m or lower the gas flow"
        )
    notes = [
        "capacity: only the fraction of the loading point is rated, not the pressure drop or the "
        "flooding point; check both against the packing's own data",
        "the packed height carries no allowance for liquid maldistribution, end effects or a design "
        "margin; add the margin your practice requires",
    ]
    if dH == 0.0:
        notes.append(
            "isothermal liquid: no heat of absorption was given; for an exothermic absorption set "
            "[equilibrium] heat_of_absorption_J_per_mol, since the warming liquid raises m and the height"
        )
    return {
        "mode": mode,
        "packing": film.packing,
        "method": film.method,
        "solute": species(gas["solute"]).name,
        "diameter_m": diameter,
        "G_mol_per_m2s": G,
        "L_mol_per_m2s": L,
        "u_V_m_per_s": u_V,
        "u_L_m_per_s": u_L,
        "loading_fraction": None if film.loading_fraction is None else float(film.loading_fraction),
        "a_e_m2_per_m3": float(film.a_e),
        "k_G_a_mol_per_m3sPa": float(film.k_G_a),
        "k_L_a_per_s": float(film.k_L_a),
        "K_y_a_mol_per_m3s": K_y_a,
        "gas_film_resistance_fraction": gas_resistance,
        "m": m,
        "m_source": m_source,
        "absorption_factor": A,
        "H_OG_m": prof.H_OG,
        "N_OG_analytic": N_OG,
        "height_m": prof.height,
        "y_out": prof.y_out,
        "x_out": prof.x_out,
        "recovery": prof.recovery,
        "accuracy": film.accuracy,
        "profile_z": "height above the bottom of the packing, where the gas enters [m]",
        "profile": {
            "z_m": prof.z.tolist(),
            "y": prof.y.tolist(),
            "x": prof.x.tolist(),
            "T_K": prof.T.tolist(),
            "y_star": prof.y_star.tolist(),
        },
        "caution": CAUTION,
        "notes": notes,
        "warnings": list(film.warnings),
    }


def _tables(r: Mapping[str, Any]) -> str:
    def g(v: Any) -> str:
        return "-" if v is None else (f"{v:.4g}" if isinstance(v, float) else str(v))

    rows = [
        ("mode", r["mode"], ""),
        ("packing / method", f"{r['packing']} / {r['method']}", ""),
        ("column diameter", g(r["diameter_m"]), "m"),
        ("gas velocity u_V", g(r["u_V_m_per_s"]), "m/s"),
        ("liquid velocity u_L", g(r["u_L_m_per_s"]), "m/s"),
        ("fraction of loading point", g(r["loading_fraction"]), "-"),
        ("effective area a_e", g(r["a_e_m2_per_m3"]), "m^2/m^3"),
        ("k_G a", g(r["k_G_a_mol_per_m3sPa"]), "mol/(m^3 s Pa)"),
        ("k_L a", g(r["k_L_a_per_s"]), "1/s"),
        ("K_y a (overall)", g(r["K_y_a_mol_per_m3s"]), "mol/(m^3 s)"),
        ("gas-film share of resistance", g(r["gas_film_resistance_fraction"]), "-"),
        ("equilibrium slope m", g(r["m"]), r["m_source"]),
        ("absorption factor A", g(r["absorption_factor"]), "-"),
        ("H_OG", g(r["H_OG_m"]), "m"),
        ("N_OG (Colburn)", g(r["N_OG_analytic"]), "-"),
        ("packed height", g(r["height_m"]), "m"),
        ("y_out", g(r["y_out"]), "-"),
        ("x_out", g(r["x_out"]), "-"),
        ("recovery", g(r["recovery"]), "-"),
    ]
    w0 = max(len(a) for a, _, _ in rows)
    w1 = max(len(b) for _, b, _ in rows)
    lines = [f"Packed absorber, {r['solute']}", "-" * (w0 + w1 + 12)]
    lines += [f"{a.ljust(w0)}  {b.rjust(w1)}  {c}".rstrip() for a, b, c in rows]
    prof = r["profile"]
    lines += [
        "",
        "Profile along the height (z above the bottom of the packing, where the gas enters)",
        f"{'z [m]':>8}  {'y':>11}  {'x':>11}  {'y*':>11}  {'T [K]':>8}",
    ]
    for z, y, x, ys, T in zip(prof["z_m"], prof["y"], prof["x"], prof["y_star"], prof["T_K"], strict=True):
        lines.append(f"{z:8.3f}  {y:11.4e}  {x:11.4e}  {ys:11.4e}  {T:8.2f}")
    lines += ["", f"Accuracy: {r['accuracy']}."]
    if r["warnings"]:
        lines += ["Warnings:", *(f"  {w}" for w in r["warnings"])]
    lines += ["Notes:", *(f"  {n}" for n in r["notes"]), f"Caution: {CAUTION}"]
    return "\n".join(lines)


def run(args: argparse.Namespace) -> str:
    """Handle ``masstransfer column``: return the text (or JSON) to print."""
    if args.example:
        return EXAMPLE_SPEC.rstrip("\n")
    if args.spec is None:
        raise InputValueError("give a spec file (masstransfer column SPEC.toml), or --example for one")
    if not 2 <= args.points <= 1000:
        raise InputValueError(f"--points={args.points} must lie between 2 and 1000")
    result = _compute(_checked(_load(args.spec)), args.points)
    if args.json:
        return json.dumps(result, indent=2)
    return _tables(result)
