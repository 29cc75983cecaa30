"""Command line: ``masstransfer demo`` and ``masstransfer diffusivity ...``.

A thin shell over the library functions: readable tables with units by
default, ``--json`` for scripts.
"""

from __future__ import annotations

import argparse
import json
import sys
from collections.abc import Sequence

import numpy as np

from .errors import MassTransferError

__all__ = ["main"]


def _parser() -> argparse.ArgumentParser:
    p = argparse.ArgumentParser(
        prog="masstransfer",
        description="Diffusivities and mass-transfer estimates for process engineering.",
    )
    sub = p.add_subparsers(dest="command", required=True)
    sub.add_parser("demo", help="print the demo report (an invented kiln-drying scenario)")
    d = sub.add_parser(
        "diffusivity",
        help="estimate a binary diffusivity in a gas or a liquid",
        description="Estimate the diffusivity of SOLUTE in MEDIUM (a gas or a liquid solvent).",
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
        "-P",
        "--pressure",
        type=float,
        default=101325.0,
        metavar="PA",
        help="pressure in Pa (gas phase; default 101325)",
    )
    d.add_argument(
        "--phase", choices=("gas", "liquid"), default="gas", help="phase of the medium (default gas)"
    )
    d.add_argument(
        "--method",
        default=None,
        help="estimation method (default: fuller for gases, wilke-chang for liquids)",
    )
    d.add_argument("--json", action="store_true", help="print JSON instead of a table")
    return p


def _diffusivity(args: argparse.Namespace) -> str:
    from .diffusivity import gas_diffusivity, liquid_diffusivity

    T = np.asarray(args.temperature, dtype=float)
    if args.phase == "gas":
        method = args.method or "fuller"
        D = np.atleast_1d(gas_diffusivity(args.solute, args.medium, T, args.pressure, method))
    else:
        method = args.method or "wilke-chang"
        D = np.atleast_1d(liquid_diffusivity(args.solute, args.medium, T, method))
    if args.json:
        return json.dumps(
            {
                "solute": args.solute,
                "medium": args.medium,
                "phase": args.phase,
                "method": method,
                "P_Pa": args.pressure if args.phase == "gas" else None,
                "T_K": T.tolist(),
                "D_m2_per_s": D.tolist(),
            },
            indent=2,
        )
    where = f"at {args.pressure:g} Pa" if args.phase == "gas" else "(infinite dilution)"
    rows = [
        f"Diffusivity of {args.solute} in {args.medium} ({args.phase}) {where}, method {method}",
        f"{'T [K]':>10}  {'D [m^2/s]':>12}",
    ]
    rows += [f"{t:10.2f}  {d:12.4e}" for t, d in zip(T, D, strict=True)]
    rows.append("Estimates: check safety-relevant designs against measured data.")
    return "\n".join(rows)


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

    Examples
    --------
    >>> main(["diffusivity", "water", "air", "-T", "298.15", "--json"]) == 0  # doctest: +ELLIPSIS
    {...
    True

    """
    args = _parser().parse_args(argv)
    try:
        if args.command == "demo":
            from .demo import demo_report

            out = demo_report()
        else:
            out = _diffusivity(args)
    except MassTransferError as exc:
        print(f"masstransfer: error: {exc}", file=sys.stderr)
        return 2
    print(out)
    return 0


if __name__ == "__main__":  # pragma: no cover
    raise SystemExit(main())
