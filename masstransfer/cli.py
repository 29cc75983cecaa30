"""Command line: a thin shell over the library functions.

Subcommands: ``demo``, ``diffusivity``, ``coefficient``, ``correlations``
and ``wet-bulb``.  Readable tables with units by default, ``--json`` for
scripts.  Errors from the library print one line (a JSON object with ``--json``) and exit with
status 2; cautions (envelope warnings) go to stderr, or into the JSON under ``"warnings"``.

Values may carry units (``-T "60 degC"``) and ``--units`` picks the units shown; see
:mod:`masstransfer._cli_units`.
"""

from __future__ import annotations

import argparse
import json
import os
import re
import sys
import warnings
from collections.abc import Callable, Sequence
from typing import Any, NoReturn

import numpy as np

from . import _cli_column, _cli_humidity, _cli_text, _cli_units
from ._version import __version__
from .errors import MassTransferError, UnknownSpeciesError

__all__ = ["main"]


class _UsageError(Exception):
    """A command-line usage mistake (unknown option, missing argument), raised by the parser."""

    def __init__(self, parser: argparse.ArgumentParser, message: str) -> None:
        super().__init__(message)
        self.parser = parser


class _Parser(argparse.ArgumentParser):
    """An argument parser that raises usage errors instead of exiting, so --json can report them."""

    def error(self, message: str) -> NoReturn:
        raise _UsageError(self, message)


def _parser() -> argparse.ArgumentParser:
    p = _Parser(
        prog="masstransfer",
        description="Diffusivities, mass-transfer coefficients and correlations for process engineering.",
    )
    p.add_argument("--version", action="version", version=f"masstransfer {__version__}")
    sub = p.add_subparsers(dest="command", required=True)
    sub.add_parser("demo", help="print the demo report (an invented kiln-drying scenario)")

    from ._cli_diffusivity import register as register_diffusivity

    register_diffusivity(sub)

    c = sub.add_parser(
        "coefficient",
        help="convert a heat-transfer coefficient to mass-transfer coefficients (or back)",
        description="Chilton-Colburn analogy with the carrier's properties at the film temperature.",
    )
    c.add_argument("solute", help="transferring species")
    c.add_argument("medium", help="carrier gas or solvent")
    given = c.add_mutually_exclusive_group(required=True)
    given.add_argument("--h", type=float, metavar="W/(m2 K)", help="known heat-transfer coefficient")
    given.add_argument("--kc", type=float, metavar="m/s", help="known mass-transfer coefficient")
    _state_args(c)

    k = sub.add_parser(
        "correlations",
        help="list the correlation catalogue, or explain one record",
        description="Without SLUG: list records (optionally of one geometry). With SLUG: explain it.",
    )
    k.add_argument("slug", nargs="?", help="record to explain, e.g. sphere-ranz-marshall")
    k.add_argument("--geometry", help="list only this geometry (e.g. sphere, duct, 'flat plate')")
    k.add_argument("--json", action="store_true", help="print JSON instead of a table")

    w = sub.add_parser(
        "wet-bulb",
        help="wet-bulb temperatures of humid air (water in air): psychrometric and adiabatic-saturation",
        description=(
            "Two wet-bulb temperatures of humid air at dry-bulb T, relative humidity RH and pressure P: "
            "the psychrometric wet bulb T_wb (the steady temperature of a wetted, well-ventilated "
            "surface, from the Chilton-Colburn heat-mass analogy with Le^(2/3)) and the "
            "adiabatic-saturation temperature T_as (the thermodynamic wet bulb of psychrometric "
            "charts), with their difference."
        ),
    )
    w.add_argument(
        "-T",
        "--temperature",
        type=float,
        nargs="+",
        required=True,
        metavar="K",
        help="dry-bulb temperature(s) in K",
    )
    w.add_argument("--rh", type=float, required=True, help="relative humidity as a fraction (0-1)")
    w.add_argument("-P", "--pressure", type=float, default=101325.0, metavar="PA", help="pressure in Pa")
    w.add_argument("--json", action="store_true", help="print JSON instead of a table")
    _cli_column.register(sub)
    _cli_humidity.register(sub)
    _cli_units.install(p)  # values with units, --units for output, --uncertainty
    return p


def _state_args(p: argparse.ArgumentParser) -> None:
    p.add_argument(
        "-T",
        "--temperature",
        type=float,
        nargs="+",
        required=True,
        metavar="K",
        help="temperature(s) in K (film temperature for coefficients)",
    )
    p.add_argument(
        "-P",
        "--pressure",
        type=float,
        default=101325.0,
        metavar="PA",
        help="pressure in Pa (gas phase; default 101325)",
    )
    p.add_argument("--phase", choices=("gas", "liquid"), default="gas", help="phase of the medium")
    p.add_argument("--json", action="store_true", help="print JSON instead of a table")


def _table(title: str, header: Sequence[str], rows: Sequence[Sequence[str]], foot: str = "") -> str:
    header, rows = _cli_units.convert_table(list(header), [list(r) for r in rows])
    widths = [max(len(h), *(len(r[i]) for r in rows)) for i, h in enumerate(header)]
    line = "  ".join(h.rjust(w) for h, w in zip(header, widths, strict=True))
    out = [title, line, "-" * len(line)]
    out += ["  ".join(c.rjust(w) for c, w in zip(r, widths, strict=True)) for r in rows]
    if foot:
        out.append(foot)
    return "\n".join(out)


def _coefficient(args: argparse.Namespace) -> str:
    from .surface._analogy import heat_transfer_coefficient_from_mass, mass_transfer_from_heat

    T = np.asarray(args.temperature, dtype=float)
    u_given = {"h_uncertainty": args.uncertainty}  # of the coefficient given, h or k_c
    if args.h is not None:
        res = mass_transfer_from_heat(
            args.h, args.solute, args.medium, T, args.pressure, phase=args.phase, **u_given
        )
        h = np.broadcast_to(np.asarray(res.h), T.shape)
    else:
        probe = mass_transfer_from_heat(1.0, args.solute, args.medium, T, args.pressure, phase=args.phase)
        h = np.atleast_1d(
            heat_transfer_coefficient_from_mass(args.kc, rho=probe.rho, cp=probe.cp, Pr=probe.Pr, Sc=probe.Sc)
        )
        res = mass_transfer_from_heat(
            h, args.solute, args.medium, T, args.pressure, phase=args.phase, **u_given
        )
    u = res.relative_uncertainty  # the same for h from k_c: one power law, read either way
    derived = "k_c_m_per_s" if args.h is not None else "h_W_per_m2K"
    fields: dict[str, Any] = {
        "T_K": T,
        "h_W_per_m2K": h,
        "k_c_m_per_s": res.k_c,
        "D_m2_per_s": res.D,
        "Pr": res.Pr,
        "Sc": res.Sc,
        "Le": res.Le,
        "rho_kg_per_m3": res.rho,
        "cp_J_per_kgK": res.cp,
    }
    if res.k_G is not None:
        fields["k_G_mol_per_m2sPa"] = res.k_G
        fields["k_y_mol_per_m2s"] = res.k_y
    if res.k_x is not None:
        fields["k_x_mol_per_m2s"] = res.k_x
    cols = {k: np.atleast_1d(np.asarray(v, dtype=float)) for k, v in fields.items()}
    cols = {k: np.broadcast_to(v, T.shape) for k, v in cols.items()}
    if args.json:
        return json.dumps(
            {
                "solute": res.solute,
                "medium": res.carrier,
                "resolved": _resolved(args.solute, args.medium),
                "phase": res.phase,
                "method": res.method,
                "warnings": list(res.warnings),
                **{k: v.tolist() for k, v in cols.items()},
                "relative_uncertainty": None if u is None else np.asarray(u, dtype=float).tolist(),
                "caution": _cli_text.CAUTION,
            },
            indent=2,
        )
    header = ["T [K]", "h [W/(m^2 K)]", "k_c [m/s]", "D [m^2/s]", "Pr", "Sc", "Le"]
    keys = ["T_K", "h_W_per_m2K", "k_c_m_per_s", "D_m2_per_s", "Pr", "Sc", "Le"]
    if "k_y_mol_per_m2s" in cols:
        header += ["k_G [mol/(m^2 s Pa)]", "k_y [mol/(m^2 s)]"]
        keys += ["k_G_mol_per_m2sPa", "k_y_mol_per_m2s"]
    if "k_x_mol_per_m2s" in cols:
        header.append("k_x [mol/(m^2 s)]")
        keys.append("k_x_mol_per_m2s")
    fmt = {"T_K": "{:.2f}", "h_W_per_m2K": "{:.4g}", "Pr": "{:.3f}", "Sc": "{:.3f}", "Le": "{:.3f}"}
    rows = [[fmt.get(k, "{:.4e}").format(cols[k][i]) for k in keys] for i in range(T.size)]
    ud = None if u is None else np.broadcast_to(np.asarray(u, dtype=float), T.shape)
    for i, row in enumerate(rows):  # ± one standard deviation on the coefficient derived
        row[keys.index(derived)] = _cli_units.plus_minus(
            float(cols[derived][i]), None if ud is None else float(ud[i]), ".4g" if args.kc else ".4e"
        )
    foot = res.method + "."
    if ud is not None:
        foot += "\n± one standard deviation, from --uncertainty and the diffusivity method's stated accuracy"
    if res.warnings:
        foot += "\nWarnings:\n  " + "\n  ".join(res.warnings)
    foot += "\n" + _cli_text.caution_line()
    return _identity_lines(args.solute, args.medium) + _table(
        f"Mass-transfer coefficients for {res.solute} in {res.carrier} ({res.phase})", header, rows, foot
    )


def _resolved(solute: str, medium: str) -> dict[str, dict[str, Any]]:
    """Describe what the names resolved to, for the JSON output."""
    return _resolved_roles((("solute", solute), ("medium", medium)))


def _resolved_roles(roles: Sequence[tuple[str, str]]) -> dict[str, dict[str, Any]]:
    """Describe what each (role, name) resolved to, for the JSON output."""
    from .substances._species import species

    out = {}
    for who, name in roles:
        sp = species(name)
        out[who] = {"query": name, "name": sp.name, "CAS": sp.CAS, "formula": sp.formula,
                    "molar_mass_kg_per_mol": sp.molar_mass}  # fmt: skip
    return out


def _identity_lines(solute: str, medium: str) -> str:
    """One line per resolved substance, above a table."""
    return _identity_lines_of((("solute", solute), ("medium", medium)))


def _identity_lines_of(roles: Sequence[tuple[str, str]]) -> str:
    """One line per (role, name) resolved, above a table."""
    from .substances._species import species

    return "".join(f"{who}: {species(name).identity}\n" for who, name in roles)


def _array_words(m: re.Match[str]) -> str:
    """Speak of the values given on the command line, not of an array and its shape."""
    bad, given = m.groups()
    return "" if given == "1" else f" (the first of {bad} refused among the {given} values given)"


#: Hints in library messages that name Python calls, and what the command line offers instead.
_CLI_HINTS: tuple[tuple[re.Pattern[str], str | Callable[[re.Match[str]], str]], ...] = (
    (re.compile(r",? or build it by hand: masstransfer\.Species\(.*$", re.S), ""),
    (re.compile(r"use another method, or supply it: dataclasses\.replace\(.*$", re.S),
     "choose another --method"),
    (re.compile(r"masstransfer\.surface\.all_correlations\(\) lists every record"),
     "'masstransfer correlations' lists every record"),
    (re.compile(r"\bmethod='([^']*)'"), r"--method \1"),
    (re.compile(r"\bpass T within"), "pass -T within"),
    (re.compile(r"use masstransfer\.liquid_diffusivity"), "use --phase liquid"),
    (re.compile(r"use masstransfer\.gas_diffusivity"), "use --phase gas"),
    (re.compile(r"pass the system pressure P="), "pass the system pressure with -P"),
    (re.compile(r"phase='gas' or phase='liquid'"), "--phase gas or --phase liquid"),
    (re.compile(r"\brelative_humidity\b"), "--rh"),
    (re.compile(r" \(first of (\d+) bad entries in an array of shape \((\d+),\)\)"), _array_words),
)  # fmt: skip


def _cli_message(message: str) -> str:
    """Reword a library error message for the command line (options, not Python calls)."""
    for pattern, replacement in _CLI_HINTS:
        message = pattern.sub(replacement, message)
    return message


def _correlations(args: argparse.Namespace) -> str:
    from .surface import _lookup as catalogue

    if args.slug:
        r = catalogue.correlation(args.slug)
        info = {
            "slug": r.slug,
            "title": r.title,
            "geometry": r.geometry,
            "convection": r.convection,
            "regime": r.regime,
            "characteristic length": r.length,
            "boundary condition": r.boundary,
            "inputs (heat form; Sc for Pr in mass transfer)": ", ".join(r.inputs),
            "parameters": ", ".join(f"{k}={'required' if v is None else v}" for k, v in r.parameters.items())
            or "none",
            "envelope": "; ".join(f"{k} {lo:g} to {hi:g}" for k, (lo, hi) in r.envelope.items()),
            "fitted on": r.fitted_on,
            "reference": r.reference,
            "stated accuracy": r.accuracy,
            "notes": r.notes or "-",
        }
        if args.json:
            return json.dumps({**info, "caution": _cli_text.CAUTION}, indent=2)
        width = max(len(k) for k in info)
        lines = [f"{k.rjust(width)} : {v}" for k, v in info.items()]
        return "\n".join([*lines, _cli_text.caution_line()])
    recs = [r for r in catalogue.all_correlations() if args.geometry in (None, r.geometry)]
    if args.geometry is not None and not recs:
        catalogue.find_correlations(args.geometry)  # raises with the accepted geometries
    if args.json:
        return json.dumps(
            [
                {
                    "slug": r.slug,
                    "geometry": r.geometry,
                    "regime": r.regime,
                    "fitted_on": r.fitted_on,
                    "title": r.title,
                }
                for r in recs
            ],
            indent=2,
        )
    return _table(
        f"Correlation catalogue: {len(recs)} records",
        ["slug", "geometry", "regime", "fitted on"],
        [[r.slug, r.geometry, r.regime, r.fitted_on] for r in recs],
        "masstransfer correlations SLUG explains one record.\n" + _cli_text.caution_line(),
    )


#: What each wet-bulb temperature is, for the text and the JSON.
_WET_BULB_KINDS = {
    "T_wb": (
        "psychrometric wet bulb as the analogy predicts it: the steady temperature of a wetted, "
        "well-ventilated surface (convected heat pays for evaporation; Chilton-Colburn heat-mass "
        "analogy, Le^(2/3))"
    ),
    "T_as": (
        "adiabatic-saturation temperature, the thermodynamic wet bulb: air saturated adiabatically "
        "by water at that temperature (an energy balance; the wet bulb of psychrometric charts)"
    ),
}


def _wet_bulb(args: argparse.Namespace) -> str:
    from .humidity._state import humid_gas_state
    from .surface._wet_surface import wet_bulb_temperature

    T = np.asarray(args.temperature, dtype=float)
    wb = np.atleast_1d(wet_bulb_temperature(T, args.rh, args.pressure))
    state = humid_gas_state("water", "air", T, args.pressure, relative_humidity=args.rh)
    ast = np.atleast_1d(np.asarray(state.adiabatic_saturation, dtype=float))
    method = (
        "T_wb from the wet-surface energy balance with the Chilton-Colburn analogy (Le^(2/3)); "
        "T_as from the adiabatic-saturation balance (ideal gases, the library's property models)"
    )
    if args.json:
        return json.dumps(
            {
                "liquid": "water",
                "gas": "air",
                "resolved": _resolved_roles((("liquid", "water"), ("gas", "air"))),
                "method": method,
                "T_K": T.tolist(),
                "relative_humidity": args.rh,
                "P_Pa": args.pressure,
                "wet_bulb_K": wb.tolist(),
                "wet_bulb": _WET_BULB_KINDS["T_wb"],
                "adiabatic_saturation_K": ast.tolist(),
                "adiabatic_saturation": _WET_BULB_KINDS["T_as"],
                "adiabatic_saturation_minus_wet_bulb_K": (ast - wb).tolist(),
                "caution": _cli_text.CAUTION,
            },
            indent=2,
        )
    foot = "\n".join(
        [
            *(f"{name}: {kind}." for name, kind in _WET_BULB_KINDS.items()),
            "T_as - T_wb: the analogy's psychrometric ratio for water in air, Le^(2/3), is about 0.9 "
            "rather than 1, so T_wb lies a little below T_as; psychrometric charts show T_as, and "
            "for water in air a well-ventilated wet bulb reads close to it (Lewis relation).",
            _cli_text.caution_line(),
        ]
    )
    title = f"Wet-bulb temperatures of humid air, relative humidity {args.rh:g}, "
    return _identity_lines_of((("liquid", "water"), ("gas", "air"))) + _table(
        title + _cli_text.pressure(args.pressure),
        ["T [K]", "T [degC]", "T_wb [K]", "T_wb [degC]", "T_as [K]", "T_as [degC]", "T_as - T_wb [K]"],
        [
            [
                f"{t:.2f}",
                f"{t - 273.15:.2f}",
                f"{w:.2f}",
                f"{w - 273.15:.2f}",
                f"{a:.2f}",
                f"{a - 273.15:.2f}",
                f"{a - w:.2f}",
            ]
            for t, w, a in zip(T, wb, ast, strict=True)
        ],
        foot,
    )


def main(argv: Sequence[str] | None = None) -> int:
    """Run the command line; return the process exit code.

    Parameters
    ----------
    argv : sequence of str, optional
        Arguments without the program name; ``sys.argv[1:]`` by default.

    Returns
    -------
    int
        0 on success, 2 when the library rejects the input.

    References
    ----------
    See the functions each subcommand calls.

    Examples
    --------
    >>> main(["diffusivity", "water", "air", "-T", "298.15", "--json"]) == 0  # doctest: +ELLIPSIS
    {...
    True

    """
    argv = list(sys.argv[1:] if argv is None else argv)
    _cli_units.start()
    try:
        args = _parser().parse_args(argv)
    except _UsageError as exc:
        if "--json" in argv:
            payload = {"error": {"type": "UsageError", "message": str(exc)}}
            _emit(json.dumps(payload, indent=2), [])
        else:
            exc.parser.print_usage(sys.stderr)
            print(f"{exc.parser.prog}: error: {exc}", file=sys.stderr)
        return 2
    _cli_units.begin(args)
    as_json = bool(getattr(args, "json", False))
    handlers = {
        "coefficient": _coefficient,
        "correlations": _correlations,
        "wet-bulb": _wet_bulb,
        "column": _cli_column.run,
        "evaporate": _cli_humidity.run,
    }
    # one process, one thread: recording every warning here is safe, and keeps `-W error`
    # (or any user filter) from turning a library caution into a traceback
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        try:
            if args.command == "demo":
                from .demo import demo_report

                out = demo_report()
            else:
                out = handlers[args.command](args) if args.command in handlers else args.handler(args)
            if as_json:
                out = _cli_units.convert_json(out)
        except MassTransferError as exc:
            return _emit_error(exc, as_json)
    notes = list(dict.fromkeys(f"{w.category.__name__}: {w.message}" for w in caught))
    kelvin = _cli_units.kelvin_caution()
    if kelvin:
        notes.append(kelvin)
    if as_json and notes:
        data = json.loads(out)
        if isinstance(data, dict):
            data["warnings"] = list(dict.fromkeys([*data.get("warnings", []), *notes]))
            out = json.dumps(data, indent=2)
            notes = []
    return _emit(out, notes)


def _emit_error(exc: MassTransferError, as_json: bool) -> int:
    """Report a rejected input: one line on stderr, or a JSON object on stdout with ``--json``."""
    message = _cli_message(str(exc))
    hint = "" if isinstance(exc, UnknownSpeciesError) else _cli_units.kelvin_hint()  # not for a name
    message = hint + message  # the likelier mistake (the unit) first, then what was refused
    if as_json:
        _emit(json.dumps({"error": {"type": type(exc).__name__, "message": message}}, indent=2), [])
    else:
        print(f"masstransfer: error: {message}", file=sys.stderr)
    return 2


def _emit(out: str, notes: Sequence[str]) -> int:
    """Print the result (and cautions on stderr); a reader that closes the pipe early ends it quietly."""
    try:
        for note in notes:
            print(f"masstransfer: caution: {note}", file=sys.stderr)
        print(out)
        sys.stdout.flush()
    except BrokenPipeError:
        # the reader (head, less) has gone: silence the interpreter's own flush at exit
        devnull = os.open(os.devnull, os.O_WRONLY)
        os.dup2(devnull, sys.stdout.fileno())
    return 0


if __name__ == "__main__":  # pragma: no cover
    raise SystemExit(main())
