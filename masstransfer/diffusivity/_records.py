"""One record per diffusivity method: its function, constants, accuracy, source and scope.

Dispatch (:func:`masstransfer.gas_diffusivity`, :func:`masstransfer.liquid_diffusivity`), the
report (:func:`masstransfer.diffusivity_report`), :func:`available_methods` and the command line
all read these records; nothing else keeps a table keyed by a method's name.

A record states where its method applies in terms of :class:`SpeciesClass` (polar,
associating, quantum gas, water, ...), which are decided from typed constants and structure,
never from text meant for people.  A class listed in ``excludes`` makes the method
inapplicable (an explicit request raises); a class listed in ``cautions`` lets it run with an
:class:`~masstransfer.errors.EnvelopeWarning`; ``requires`` lists the classes one member of the
pair must have for the method to be in its own class.
"""

from __future__ import annotations

import enum
from collections.abc import Callable, Mapping
from dataclasses import dataclass, field
from typing import Any, Literal

from .._validation import guard
from ..constants import DEBYE
from ..substances._species import Species

__all__ = [
    "ConstantUsed",
    "DiffusivityMethod",
    "MethodAvailability",
    "Prepared",
    "SpeciesClass",
    "classify",
]

Phase = Literal["gas", "liquid"]

#: Dipole moment from which a species counts as polar [C m] (1 debye; common practice).
POLAR_DIPOLE = 1.0 * DEBYE

_WATER = "7732-18-5"
#: Helium, hydrogen, deuterium and neon: light molecules whose transport properties depart from
#: classical corresponding states (Poling, Prausnitz & O'Connell 2001, Section 9-4, from memory).
_QUANTUM = frozenset({"7440-59-7", "1333-74-0", "7782-39-0", "7440-01-9"})


class SpeciesClass(enum.Enum):
    """Classes of species that decide whether a method applies."""

    POLAR = "polar (dipole moment 1 D or more)"
    NONPOLAR = "non-polar (dipole moment below 1 D)"
    DIPOLE_UNKNOWN = "dipole moment unknown"
    ASSOCIATING = "associating (O-H or N-H hydrogen-bond donor)"
    QUANTUM = "quantum gas (He, H2, D2, Ne)"
    WATER = "water"
    ACID = "carboxylic acid"
    ALCOHOL = "monohydroxy alcohol"
    N_PARAFFIN = "n-paraffin (C5 or longer)"
    ELECTROLYTE = "strong electrolyte (a salt, strong acid or strong base: dissociates into ions in water)"
    ION = "single ion (a charged species)"


@guard(check_output=False)
def classify(sp: str | Species) -> frozenset[SpeciesClass]:
    """Return the :class:`SpeciesClass` members that describe a species.

    Parameters
    ----------
    sp : str or Species
        The species [-] (name, CAS number, formula or :class:`~masstransfer.Species`).

    Returns
    -------
    frozenset of SpeciesClass
        Its classes: exactly one of polar, non-polar or dipole-unknown, and any of
        associating, quantum gas, water, acid, monohydroxy alcohol, n-paraffin, strong
        electrolyte, single ion.

    Notes
    -----
    Decided from typed data only: CAS number, dipole moment (``None`` is unknown, not zero),
    atom counts and the SMILES structure.  Polar means a dipole moment of 1 D or more (common
    practice).  A species of carbon and hydrogen only whose dipole is unknown is classed
    non-polar (common practice: hydrocarbons have dipole moments well below 1 D).

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The Properties of Gases and
    Liquids*, 5th ed., Sections 11-3 and 11-9 (the classes their methods name).

    Examples
    --------
    >>> sorted(c.name for c in classify("water"))
    ['ASSOCIATING', 'POLAR', 'WATER']

    """
    from ..substances._species import species

    sp = species(sp)
    out: set[SpeciesClass] = set()
    if sp.dipole is None:
        hydrocarbon = bool(sp.atoms) and set(sp.atoms) <= {"C", "H"}
        out.add(SpeciesClass.NONPOLAR if hydrocarbon else SpeciesClass.DIPOLE_UNKNOWN)
    elif sp.dipole >= POLAR_DIPOLE:
        out.add(SpeciesClass.POLAR)
    else:
        out.add(SpeciesClass.NONPOLAR)
    if sp.CAS in _QUANTUM:
        out.add(SpeciesClass.QUANTUM)
    if sp.CAS == _WATER:
        out |= {SpeciesClass.WATER, SpeciesClass.ASSOCIATING}
    from ._ions import ionic_kind

    kind = ionic_kind(sp)
    if kind == "electrolyte":
        out.add(SpeciesClass.ELECTROLYTE)
    elif kind == "ion":
        out.add(SpeciesClass.ION)
    mol = sp.molecule
    if mol is not None:
        from ..substances._species import _le_bas_class

        donors = False
        for i, el in enumerate(mol.elements):
            if el not in ("O", "N"):
                continue
            n_heavy = len(mol.neighbours(i))
            valence = 2 if el == "O" else 3
            bonds = sum(o for _, o in mol.neighbours(i))
            if n_heavy < valence and bonds < valence and not mol.aromatic_atoms[i]:
                donors = True  # an O or N carrying hydrogen
            if el == "O" and _le_bas_class(mol, i) == "O_acid":
                out.add(SpeciesClass.ACID)
        if donors:
            out.add(SpeciesClass.ASSOCIATING)
        if _is_monohydroxy_alcohol(sp):
            out.add(SpeciesClass.ALCOHOL)
        if _is_n_paraffin(sp):
            out.add(SpeciesClass.N_PARAFFIN)
    return frozenset(out)


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


class Role(enum.Enum):
    """Which member of the pair a class condition looks at."""

    SOLUTE = "solute"
    MEDIUM = "medium"
    EITHER = "either member"


@dataclass(frozen=True)
class ClassRule:
    """A condition on one member's classes, with the reason shown to the user."""

    cls: SpeciesClass
    role: Role
    reason: str

    def matches(self, solute: frozenset[SpeciesClass], medium: frozenset[SpeciesClass]) -> bool:
        """Whether the condition holds for this pair."""
        if self.role is Role.SOLUTE:
            return self.cls in solute
        if self.role is Role.MEDIUM:
            return self.cls in medium
        return self.cls in solute or self.cls in medium


@dataclass(frozen=True)
class ConstantUsed:
    """One constant a method used: its value (SI) and where it came from."""

    value: float | None
    source: str


@dataclass(frozen=True)
class Prepared:
    """A method's constants for one (solute, medium) pair, after its special rules."""

    args: tuple[Any, ...]
    constants: Mapping[str, Mapping[str, ConstantUsed]]
    notes: tuple[str, ...] = ()
    cautions: tuple[str, ...] = ()
    form: str = ""


@dataclass(frozen=True)
class DiffusivityMethod:
    """A diffusivity method as the dispatchers, report and command line see it.

    Attributes
    ----------
    name : str
        Canonical name accepted by ``method=`` (e.g. ``'fuller'``).
    phase : {'gas', 'liquid'}
        Phase of the medium the method is for.
    title : str
        Authors and year.
    function : callable
        The numbers-in function (e.g. :func:`~masstransfer.diffusivity.fuller`).
    constants : tuple of str
        The :class:`~masstransfer.Species` constants the method reads.
    accuracy_pct : float
        Average absolute deviation its sources report [%].
    accuracy : str
        That statement, with its source.
    reference : str
        The method's primary reference.
    scope : str
        Where it applies, in words.
    T_range : tuple of float
        Temperatures of the data it was fitted or tested on [K] (outside: a warning).
    P_max : float or None
        Highest pressure of its range [Pa] (gas methods).
    requires, excludes, cautions : tuple of ClassRule
        Class conditions: one of ``requires`` must hold for the pair to be in the method's own
        class (else a caution); any of ``excludes`` makes it inapplicable; any of ``cautions``
        makes it run with a warning.
    prepare : callable
        ``prepare(solute, medium) -> Prepared``: the constants after the special rules.
    evaluate : callable
        ``evaluate(prepared, T, x)`` with ``x`` the pressure (gas) or solvent viscosity
        (liquid): the same arithmetic as ``function``, inputs already checked.

    """

    name: str
    phase: Phase
    title: str
    function: Callable[..., Any]
    constants: tuple[str, ...]
    accuracy_pct: float
    accuracy: str
    reference: str
    scope: str
    T_range: tuple[float, float]
    P_max: float | None
    prepare: Callable[[Species, Species], Prepared] = field(repr=False)
    evaluate: Callable[..., Any] = field(repr=False)
    requires: tuple[ClassRule, ...] = ()
    excludes: tuple[ClassRule, ...] = ()
    cautions: tuple[ClassRule, ...] = ()

    def class_verdict(
        self, solute: frozenset[SpeciesClass], medium: frozenset[SpeciesClass]
    ) -> tuple[tuple[str, ...], tuple[str, ...]]:
        """(reasons it does not apply, cautions) for a pair of classified species."""
        blocked = tuple(r.reason for r in self.excludes if r.matches(solute, medium))
        warn = [r.reason for r in self.cautions if r.matches(solute, medium)]
        if self.requires and not any(r.matches(solute, medium) for r in self.requires):
            warn.append(
                "outside its class: meant for pairs with "
                + " or ".join(f"a {r.cls.value} {r.role.value}" for r in self.requires)
            )
        return blocked, tuple(warn)


@dataclass(frozen=True)
class MethodAvailability:
    """Whether one method applies to a pair, and why (see :func:`available_methods`).

    Attributes
    ----------
    method : str
        The method's name.
    applies : bool
        True when the method can be used for the pair (its constants exist and no class
        excludes it).
    default : bool
        True for the method the dispatcher uses when ``method`` is not given.
    accuracy_pct : float
        The method's published average absolute deviation [%].
    reasons : tuple of str
        Why it does not apply, or the cautions that come with it.

    """

    method: str
    applies: bool
    default: bool
    accuracy_pct: float
    reasons: tuple[str, ...]
