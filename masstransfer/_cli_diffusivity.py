"""The ``masstransfer diffusivity`` subcommand: parser and handler.

The method, its stated accuracy and reference, the special rules applied and the phase all come
from the method records through :func:`masstransfer.diffusivity_report`.
"""

from __future__ import annotations

import argparse
import json
from typing import Any

import numpy as np

__all__ = ["register"]


def register(sub: Any) -> None:
    """Add the ``diffusivity`` subcommand to an ``argparse`` subparsers object."""
    from .diffusivity import GAS_METHODS, LIQUID_METHODS

    d = sub.add_parser(
        "diffusivity",
        help="estimate a binary diffusivity in a gas or a liquid",
        description=(
            "Estimate the diffusivity of SOLUTE in MEDIUM (a gas or a liquid solvent). Without "
            "--phase the phase is inferred from the medium's state at T and P, and printed."
        ),
    )
    d.add_argument("solute", help="diffusing species: name, CAS number or formula")
    d.add_argument("medium", help="carrier gas (e.g. air) or solvent (e.g. water)")
    d.add_argument(
        "-T",
        "--temperature",
        type=float,
        nargs="+",
        required=True,
        metavar="K",
        help="temperature(s) in K",
    )
    d.add_argument(
        "-P", "--pressure", type=float, default=101325.0, metavar="PA", help="pressure in Pa (default 101325)"
    )
    d.add_argument(
        "--phase",
        choices=("gas", "liquid"),
        default=None,
        help="phase of the medium (default: inferred from its state at T and P)",
    )
    d.add_argument(
        "--method",
        default=None,
        help=(
            "estimation method (default: the published recommendation for the pair); gas: "
            f"{', '.join(GAS_METHODS)}; liquid: {', '.join(LIQUID_METHODS)}"
        ),
    )
    d.add_argument(
        "--explain",
        action="store_true",
        help="also print the constants with their sources and every rule applied",
    )
    d.add_argument("--json", action="store_true", help="print JSON instead of a table")
    d.set_defaults(handler=run)


def run(args: argparse.Namespace) -> str:
    """Compute and format the diffusivity for the parsed arguments."""
    from ._cli_text import CAUTION, caution_line, pressure
    from ._cli_units import convert_table, plus_minus
    from .diffusivity._report import diffusivity_report

    T = np.asarray(args.temperature, dtype=float)
    # library messages name keywords (phase=, P=); the command line rewords them as options
    report = diffusivity_report(
        args.solute, args.medium, T, args.pressure, phase=args.phase, method=args.method
    )
    D = np.atleast_1d(np.asarray(report.value, dtype=float))
    inferred = args.phase is None
    if args.json:
        return json.dumps(
            {
                "solute": report.solute,
                "medium": report.medium,
                "resolved": _resolved(args.solute, args.medium),
                "phase": report.phase,
                "phase_inferred": inferred,
                "method": report.method,
                "accuracy_pct": report.accuracy_pct,
                "accuracy": report.accuracy,
                "reference": report.reference,
                "P_Pa": args.pressure if report.phase == "gas" else None,
                "T_K": T.tolist(),
                "D_m2_per_s": D.tolist(),
                "relative_uncertainty": report.relative_uncertainty,
                "notes": list(report.notes),
                "warnings": list(report.warnings),
                "caution": CAUTION,
            },
            indent=2,
        )
    where = f"gas at {pressure(args.pressure)}" if report.phase == "gas" else "liquid, infinite dilution"
    inferred_note = next((n for n in report.notes if n.startswith("phase inferred: ")), None)
    if inferred and inferred_note is not None:  # the phase is stated once, on its own line
        how = "inferred: " + inferred_note.removeprefix("phase inferred: ")
    else:
        how = "inferred from the medium's state at T and P" if inferred else "as given"
    notes = [n for n in report.notes if n is not inferred_note]
    lines = [
        f"Diffusivity of {report.solute} in {report.medium} ({where})",
        f"solute: {report.solute_identity}",
        f"medium: {report.medium_identity}",
        f"phase: {report.phase} ({how})",
        f"method: {report.method}; stated accuracy {report.accuracy_pct:g} % ({report.accuracy})",
    ]
    u = report.relative_uncertainty  # one standard deviation from the stated accuracy
    rows = [
        [f"{t:.2f}", plus_minus(float(d), u), plus_minus(float(d) * 1e4, u)]
        for t, d in zip(T, D, strict=True)
    ]
    header, rows = convert_table(["T [K]", "D [m^2/s]", "D [cm^2/s]"], rows)  # --units, if given
    widths = [max(len(h), *(len(r[i]) for r in rows)) for i, h in enumerate(header)]
    row = "  ".join(h.rjust(w) for h, w in zip(header, widths, strict=True))
    lines += [row, "-" * len(row)]
    for cells in rows:
        lines.append("  ".join(c.rjust(w) for c, w in zip(cells, widths, strict=True)))
    if u is not None:
        lines.append(
            f"± one standard deviation, {100 * u:.1f} %: the stated average absolute deviation, "
            f"{report.accuracy_pct:g} %, times sqrt(pi/2) (normally distributed errors)"
        )
    if args.explain:
        lines += ["", report.summary()]
    else:
        lines += [f"note: {n}" for n in notes]
        lines += [f"caution: {w}" for w in report.warnings]
    lines.append(caution_line())
    return "\n".join(lines)


def _resolved(solute: str, medium: str) -> dict[str, dict[str, Any]]:
    """Describe what the names resolved to, for the JSON output."""
    from .substances._species import species

    out = {}
    for who, name in (("solute", solute), ("medium", medium)):
        sp = species(name)
        out[who] = {"query": name, "name": sp.name, "CAS": sp.CAS, "formula": sp.formula,
                    "molar_mass_kg_per_mol": sp.molar_mass}  # fmt: skip
    return out
