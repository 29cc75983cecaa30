"""Strong electrolytes and single ions, recognised from a species' identity and split into ions.

A solute that dissociates in water (a salt, a strong mineral acid, a strong base) diffuses as
its ions, held together by their charges; the molecular correlations (Wilke-Chang,
Hayduk-Minhas, Tyn-Calus) do not describe it.  A single ion cannot diffuse on its own at all:
its flux is coupled to that of a counter-ion.  This module decides which case a species is,
from typed identity fields only (CAS number, SMILES charges, formula), and splits a strong
electrolyte into the ions of :data:`masstransfer._tables.LIMITING_ION_DIFFUSIVITY`.
"""

from __future__ import annotations

import functools
import math
import re
from dataclasses import dataclass
from typing import Literal

from .. import _tables as data
from ..substances._species import Species

__all__ = ["Salt", "ionic_kind", "salt_ions"]

#: Anions whose acids are strong (fully dissociated in dilute water; common practice).
_STRONG_ACID_ANIONS = frozenset({"Cl-", "Br-", "I-", "NO3-", "ClO4-", "SO4 2-"})
#: Metals whose salts and hydroxides are strong electrolytes: alkali and alkaline-earth.
_SALT_METALS = frozenset({"Li", "Na", "K", "Rb", "Cs", "Mg", "Ca", "Sr", "Ba"})
#: Metals whose inorganic compounds (no carbon) dissolve, where they dissolve, as ions
#: (common practice); with carbon only an ionic SMILES decides (organometallics stay molecular).
_METALS = _SALT_METALS | frozenset(
    {"Al", "Fe", "Cu", "Zn", "Ni", "Co", "Mn", "Cr", "Pb", "Ag", "Cd", "Hg", "Sn", "Ti", "V"}
)
_BRACKET = re.compile(r"\[([^\]]*)\]")
_CHARGE = re.compile(r"(\++|-+)(\d*)$")

Kind = Literal["ion", "electrolyte"]


@dataclass(frozen=True)
class Salt:
    """A strong electrolyte split into one cation and one anion of the ion table."""

    cation: str
    anion: str
    z_cation: int  # charge number magnitude [-]
    z_anion: int  # charge number magnitude [-]
    D_cation: float  # limiting ionic diffusivity at 25 C [m^2/s]
    D_anion: float  # limiting ionic diffusivity at 25 C [m^2/s]


def _net_charge(fragment: str) -> int:
    """Net charge of one dot-free SMILES fragment, from its bracket atoms ('[Na+]', '[O-]', '[Ca+2]')."""
    total = 0
    for m in _BRACKET.finditer(fragment):
        body = m.group(1).split(":")[0]  # drop an atom-map class
        c = _CHARGE.search(body)
        if c is None:
            continue
        signs, digits = c.groups()
        size = int(digits) if digits else len(signs)
        total += size if signs[0] == "+" else -size
    return total


@functools.lru_cache(maxsize=1024)
def _split(atoms: tuple[tuple[str, int], ...]) -> Salt | None:
    have = dict(atoms)
    ions = data.LIMITING_ION_DIFFUSIVITY
    cations = [k for k, v in ions.items() if v[0] > 0]
    anions = [k for k, v in ions.items() if v[0] < 0]
    for cat in cations:
        zc, cat_atoms, Dc = ions[cat]
        for an in anions:
            if cat == "H+" and an not in _STRONG_ACID_ANIONS:
                continue  # weak acids (carbonic, formic, acetic) stay molecular
            if cat == "NH4+" and an == "OH-":
                continue  # aqueous ammonia is a weak base
            za, an_atoms, Da = ions[an]
            za = -za
            g = math.gcd(zc, za)
            n_cat, n_an = za // g, zc // g
            combined: dict[str, int] = {}
            for el, n in cat_atoms:
                combined[el] = combined.get(el, 0) + n_cat * n
            for el, n in an_atoms:
                combined[el] = combined.get(el, 0) + n_an * n
            if combined == have:
                return Salt(cat, an, zc, za, Dc, Da)
    return None


def salt_ions(sp: Species) -> Salt | None:
    """Return the cation and anion of a strong electrolyte from the ion table, or None.

    Matched by atom counts: the formula must be exactly a whole number of cations and anions
    in charge balance (NaCl, CaCl2, H2SO4, (NH4)2SO4, NaHCO3).  Hydrogen pairs only with the
    anions of strong acids, and ammonium not with hydroxide (weak acids and bases stay
    molecular).
    """
    atoms = tuple(sorted((str(k), int(v)) for k, v in sp.atoms.items()))
    return _split(atoms) if atoms else None


def ionic_kind(sp: Species) -> Kind | None:
    """'electrolyte' for a strong electrolyte, 'ion' for a single charged species, else None.

    Decided from typed identity fields only:

    * a strong mineral acid by its CAS number (:data:`masstransfer._tables.STRONG_ACIDS`);
    * a salt or strong base by a SMILES of several fragments that carry charges
      (``[Na+].[OH-]``), the way ``chemicals`` writes ionic compounds;
    * a single ion by a SMILES of one fragment with a net charge (``[O-]S(=O)(=O)[O-]``), or
      a charge in a formula given without SMILES;
    * an inorganic compound of a metal with another element (no carbon: CuSO4, FeCl3, NaOH
      written covalently; not the element itself, such as mercury);
    * a species given without SMILES whose formula is an alkali or alkaline-earth metal salt
      of the ion table (a hand-built ``Species(formula="C2H3NaO2", ...)``).

    Nitric acid's SMILES carries formal charges on one neutral fragment: net charge zero, so
    it is not taken for an ion (it is a strong acid by its CAS number).
    """
    if (sp.CAS or "") in data.STRONG_ACIDS:
        return "electrolyte"
    smiles = sp.smiles or ""
    if smiles:
        fragments = [f for f in smiles.split(".") if f]
        charges = [_net_charge(f) for f in fragments]
        if len(fragments) > 1 and any(charges):
            return "electrolyte"
        if len(fragments) == 1 and charges[0] != 0:
            return "ion"
    elif "+" in (sp.formula or "") or "-" in (sp.formula or ""):
        return "ion"
    elements = set(sp.atoms)
    if len(elements) > 1 and elements & _METALS and "C" not in elements:
        return "electrolyte"  # an inorganic metal compound: salt, hydroxide (CuSO4, FeCl3, NaOH)
    if not smiles and elements & _SALT_METALS and salt_ions(sp) is not None:
        return "electrolyte"  # a hand-built salt given by its formula (sodium acetate)
    return None
