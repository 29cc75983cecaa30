"""Species: identity and constants, resolved once through ``chemicals`` and cached.

A :class:`Species` is a frozen record of the constants the estimation
methods need, in SI units.  :func:`species` resolves a name, CAS number or
formula through ``chemicals`` (and the molar volume at the normal boiling
point through ``thermo``), or returns the built-in pseudo-species ``"air"``.
Anything no database knows can be built by hand::

    Species(name="my solvent", molar_mass=0.1502, Tb=455.0, Vb=1.9e-4)

Only this module and :mod:`masstransfer.substances` talk to the databases;
they are imported on first use, so ``import masstransfer`` stays light.
"""

from __future__ import annotations

import dataclasses
import difflib
import enum
import functools
import math
import re
from collections.abc import Iterator, Mapping
from dataclasses import dataclass, field
from typing import TYPE_CHECKING, Any, NamedTuple, TypeVar

from .. import _tables as data
from .._validation import guard, warn_caller
from ..constants import DEBYE
from ..errors import (
    AmbiguousSpeciesWarning,
    InputTypeError,
    InputValueError,
    MissingConstantError,
    UnknownSpeciesError,
)
from . import _names
from ._databases import loading, thermo_models
from ._structure import Molecule, parse_smiles

__all__ = ["FrozenMap", "Origin", "Species", "le_bas_volume", "species"]

_K = TypeVar("_K")
_V = TypeVar("_V")


class FrozenMap(Mapping[_K, _V]):
    """A read-only, hashable, picklable mapping (the atoms and sources of a :class:`Species`)."""

    __slots__ = ("_data", "_hash")
    _data: dict[_K, _V]
    _hash: int | None

    def __init__(self, data: Mapping[_K, _V] | None = None) -> None:
        object.__setattr__(self, "_data", dict(data or {}))
        object.__setattr__(self, "_hash", None)

    def __getitem__(self, key: _K) -> _V:
        return self._data[key]

    def __iter__(self) -> Iterator[_K]:
        return iter(self._data)

    def __len__(self) -> int:
        return len(self._data)

    def __setattr__(self, name: str, value: Any) -> None:
        raise AttributeError(f"{type(self).__name__} is read-only")

    def __hash__(self) -> int:
        h = self._hash
        if h is None:
            h = hash(frozenset(self._data.items()))
            object.__setattr__(self, "_hash", h)
        return int(h)

    def __eq__(self, other: object) -> bool:
        if isinstance(other, Mapping):
            return bool(self._data == dict(other))
        return NotImplemented

    def __repr__(self) -> str:
        return repr(self._data)

    def __reduce__(self) -> tuple[Any, ...]:
        return (type(self), (self._data,))


_CAS_PATTERN = re.compile(r"\d{2,7}-\d{2}-\d")
_AIR_NAMES = frozenset({"air", "dry air"})

#: Largest dipole moment accepted [C m]: 12 debye, above every small molecule's (common practice:
#: water 1.85 D, acetonitrile 3.9 D, DMSO 4.0 D, ionic-liquid ion pairs about 10 D).
_DIPOLE_LIMIT = 12 * 3.33564e-30

_FLOAT_FIELDS = (
    "molar_mass",
    "Tb",
    "Tm",
    "Tc",
    "Pc",
    "Vc",
    "sigma",
    "epsilon_k",
    "Vb",
    "fuller_volume",
    "parachor",
)
_CONSTANT_FIELDS = (*_FLOAT_FIELDS, "omega", "dipole")


class Origin(enum.Enum):
    """Where a constant of a :class:`Species` came from.

    Methods decide by this typed field, never by the free text of ``Species.sources``.
    """

    DATABASE = "database"  #: a data-table or fitted-model value from chemicals/thermo
    TABULATED = "tabulated"  #: a published table of this very constant (e.g. Svehla's LJ values)
    ESTIMATED = "estimated"  #: computed from other constants by a correlation or group method
    USER = "user"  #: given by the caller


@dataclass(frozen=True)
class Species:
    """Identity and constants of one chemical species (SI units).

    Parameters
    ----------
    name : str
        Name used in messages and reports.
    molar_mass : float
        Molar mass [kg/mol].
    CAS : str, optional
        CAS registry number, used for table look-ups (special diffusion
        volumes, association factors).
    formula : str, optional
        Hill formula, e.g. ``"C7H8"``.
    smiles : str, optional
        SMILES string; used for ring increments of group contributions.
    atoms : mapping of str to int, optional
        Atom counts; derived from ``formula`` when omitted.
    Tb : float, optional
        Normal boiling point [K].
    Tm : float, optional
        Melting point [K].
    Tc : float, optional
        Critical temperature [K].
    Pc : float, optional
        Critical pressure [Pa].
    Vc : float, optional
        Critical molar volume [m^3/mol].
    omega : float, optional
        Acentric factor [-].
    sigma : float, optional
        Lennard-Jones collision diameter [m].
    epsilon_k : float, optional
        Lennard-Jones well depth over Boltzmann's constant [K].
    dipole : float, optional
        Dipole moment [C m] (one debye is :data:`DEBYE`).
    Vb : float, optional
        Liquid molar volume at the normal boiling point [m^3/mol].
    fuller_volume : float, optional
        Fuller diffusion volume of the whole molecule [cm^3/mol, the
        method's nominal unit]; overrides the group sum.
    parachor : float, optional
        Parachor [N^0.25 m^2.75/mol]; multiply by 5.623413e6 for the
        tabulated cm-g-s form.  Computed from ``thermo`` when omitted.
    sources : mapping of str to str, optional
        Where each constant came from, in words (filled in by :func:`species`).
    origins : mapping of str to Origin, optional
        Where each constant came from, typed; a constant given without one is
        :attr:`Origin.USER`.  Part of equality, so cached results never mix
        a tabulated constant with an equal user-supplied one.

    Examples
    --------
    >>> s = Species(name="solvent X (invented)", molar_mass=0.1, Tb=400.0, Vb=1.2e-4)
    >>> s.molar_mass
    0.1

    """

    name: str
    molar_mass: float
    CAS: str | None = None
    formula: str | None = None
    smiles: str | None = None
    atoms: Mapping[str, int] = field(default_factory=FrozenMap)
    Tb: float | None = None
    Tm: float | None = None
    Tc: float | None = None
    Pc: float | None = None
    Vc: float | None = None
    omega: float | None = None
    sigma: float | None = None
    epsilon_k: float | None = None
    dipole: float | None = None
    Vb: float | None = None
    fuller_volume: float | None = None
    parachor: float | None = None
    sources: Mapping[str, str] = field(default_factory=FrozenMap, compare=False)
    origins: Mapping[str, Origin] = field(default_factory=FrozenMap)

    def __post_init__(self) -> None:
        if not isinstance(self.name, str):
            raise InputTypeError(f"Species name={self.name!r} is a {type(self.name).__name__}; pass a string")
        for name in (*_FLOAT_FIELDS, "omega", "dipole"):
            value = getattr(self, name)
            if value is None and name != "molar_mass":
                continue
            if isinstance(value, bool) or not isinstance(value, int | float):
                raise InputTypeError(
                    f"Species {self.name!r}: {name}={value!r} is a {type(value).__name__}, not a "
                    + ("number; the molar mass is required [kg/mol]" if value is None else "number")
                )
            if name == "omega":  # the acentric factor may be negative (H2, He, Ne)
                if not math.isfinite(value) or not -1.0 < value < 3.0:
                    raise InputValueError(
                        f"Species {self.name!r}: omega={value!r} is not a plausible acentric factor "
                        "(about -0.4 to 2); check the value"
                    )
                continue
            if name == "dipole":  # zero for a non-polar molecule
                if not math.isfinite(value) or value < 0:
                    raise InputValueError(
                        f"Species {self.name!r}: dipole={value!r} must be a finite number >= 0 [C m]"
                    )
                if value > _DIPOLE_LIMIT:
                    raise InputValueError(
                        f"Species {self.name!r}: dipole={value!r} C m is implausible (no small molecule "
                        f"exceeds about 12 debye = {_DIPOLE_LIMIT:.1e} C m); it looks like a value in "
                        "debye: multiply by masstransfer.constants.DEBYE (3.33564e-30 C m)"
                    )
                continue
            if not math.isfinite(value) or value <= 0:
                raise InputValueError(
                    f"Species {self.name!r}: {name}={value!r} must be a finite positive "
                    "number in SI units (or omitted)"
                )
        if self.molar_mass > 2.0:
            raise InputValueError(
                f"Species {self.name!r}: molar_mass={self.molar_mass!r} kg/mol is implausible; "
                "molar masses are in kg/mol (divide g/mol by 1000)"
            )
        if self.Vb is not None and self.Vb > 0.01:
            raise InputValueError(
                f"Species {self.name!r}: Vb={self.Vb!r} m^3/mol is implausible; "
                "molar volumes are in m^3/mol (divide cm^3/mol by 1e6)"
            )
        if self.sigma is not None and self.sigma > 1e-8:
            raise InputValueError(
                f"Species {self.name!r}: sigma={self.sigma!r} m is implausible; "
                "the collision diameter is in metres (multiply angstrom by 1e-10)"
            )
        if self.atoms is None or not isinstance(self.atoms, Mapping):
            raise InputTypeError(
                f"Species {self.name!r}: atoms={self.atoms!r} must be a mapping of element to count"
            )
        atoms = dict(self.atoms)
        if not atoms and self.formula:
            atoms = _formula_atoms(self.formula)
        if not atoms and self.smiles:
            mol = _molecule(self.smiles)
            atoms = mol.atom_counts() if mol is not None else {}
        sources = dict(self.sources)
        object.__setattr__(self, "atoms", FrozenMap(atoms))
        if self.formula is None and atoms:
            object.__setattr__(self, "formula", _hill(atoms))
        if self.Vb is None and atoms:  # a hand-built species from a formula or SMILES
            readable = self.smiles if self.smiles and _molecule(self.smiles) is not None else None
            try:
                object.__setattr__(self, "Vb", le_bas_volume(atoms, readable))
                sources["Vb"] = "Le Bas additive volumes, estimated from structure"
                if "Vb" not in self.origins:
                    object.__setattr__(self, "origins", {**self.origins, "Vb": Origin.ESTIMATED})
            except (MissingConstantError, InputValueError):
                pass
        object.__setattr__(self, "sources", FrozenMap(sources))
        given = dict(self.origins)
        origins = {n: given.get(n, Origin.USER) for n in _CONSTANT_FIELDS if getattr(self, n) is not None}
        object.__setattr__(self, "origins", FrozenMap(origins))

    def __eq__(self, other: object) -> bool:
        if self is other:
            return True
        if type(other) is not type(self):
            return NotImplemented
        return all(
            getattr(self, f.name) == getattr(other, f.name) for f in dataclasses.fields(self) if f.compare
        )

    def __hash__(self) -> int:
        # identity fields only: known without reading any database, and equal for equal species
        return hash((self.name, self.molar_mass, self.CAS, self.formula, self.smiles, self.atoms))

    if not TYPE_CHECKING:

        def __getattr__(self, name: str) -> Any:
            # constants of a database species are read on first use (see _lazy_species)
            d = object.__getattribute__(self, "__dict__")
            if "_pending" not in d or name.startswith("__"):
                raise AttributeError(name)
            _complete(self, stage_a=name in _STAGE_A)
            if name in d:
                return d[name]
            raise AttributeError(name)

    @property
    def identity(self) -> str:
        """Name, CAS number, formula and molar mass in one line, for tables and reports."""
        cas = f"CAS {self.CAS}" if self.CAS else "no CAS number"
        formula = self.formula or "formula not given"
        return f"{self.name} ({cas}, {formula}, {self.molar_mass * 1000.0:.2f} g/mol)"

    @property
    def molecule(self) -> Molecule | None:
        """The heavy-atom graph read from :attr:`smiles`, or None."""
        if not self.smiles:
            return None
        return _molecule(self.smiles)

    def _source_of(self, name: str) -> tuple[str | None, Origin | None]:
        """(source text, origin) of constant ``name``; an identity constant's without reading the rest."""
        d = object.__getattribute__(self, "__dict__")
        if "_pending" in d and name in d.get("_early_sources", {}):
            text, origin = d["_early_sources"][name]
            return text, origin
        return self.sources.get(name), self.origins.get(name)

    def require(self, name: str, method: str) -> float:
        """Return constant ``name``, or raise naming the method that needs it."""
        value = getattr(self, name)
        if value is None:
            raise MissingConstantError(
                f"species {self.name!r} has no {name}, which the {method} method needs; "
                f"use another method, or supply it: "
                f"masstransfer.species({self.name!r}).replace({name}=...)"
            )
        return float(value)

    def replace(self, **changes: Any) -> Species:
        """Return a copy with some constants changed (marked as user-supplied)."""
        sources = dict(self.sources)
        origins = dict(self.origins)
        for key in changes:
            sources[key] = "user"
            origins[key] = Origin.USER
        return dataclasses.replace(self, sources=sources, origins=origins, **changes)


# A database species is created with its identity only and reads its other constants on first
# use (``__getattr__``).  That needs every field absent from the class itself: the defaults live
# on in the dataclass fields and the generated ``__init__``.
for _f in dataclasses.fields(Species):
    if _f.name in Species.__dict__:
        delattr(Species, _f.name)


def check_structure(atoms: Any, smiles: Any) -> Molecule | None:
    """Validate atom counts and an optional SMILES string; return the molecule read from it."""
    from chemicals.elements import periodic_table

    if not isinstance(atoms, Mapping):
        raise InputTypeError(
            f"atoms={atoms!r} is a {type(atoms).__name__}; pass a mapping of element to count, "
            "e.g. {'C': 2, 'H': 6, 'O': 1}"
        )
    for el, n in atoms.items():
        if not isinstance(el, str) or isinstance(n, bool) or not isinstance(n, int):
            raise InputTypeError(
                f"atoms={dict(atoms)!r}: each entry must be an element symbol (str) and a whole "
                f"count (int); got {el!r}: {n!r}"
            )
        if el not in periodic_table or n < 0:
            raise InputValueError(
                f"atoms={dict(atoms)!r}: {el!r}: {n!r} is not an element symbol with a count of zero or more"
            )
    if smiles is None:
        return None
    if not isinstance(smiles, str):
        raise InputTypeError(f"smiles={smiles!r} is a {type(smiles).__name__}; pass a SMILES string or None")
    mol = _molecule(smiles) if smiles.strip() else None
    if mol is None or not mol.elements:
        raise InputValueError(
            f"smiles={smiles!r} could not be read; pass a plain SMILES string (atoms, bonds, "
            "branches and ring closures) or omit it"
        )
    return mol


def _formula_atoms(formula: str) -> dict[str, int]:
    from chemicals.elements import simple_formula_parser

    try:
        return {str(k): int(v) for k, v in simple_formula_parser(formula).items()}
    except Exception:  # an unreadable formula leaves the atoms unknown
        return {}


def _hill(atoms: Mapping[str, int]) -> str:
    """Hill formula: C, then H, then the other elements alphabetically."""
    order = [e for e in ("C", "H") if e in atoms and "C" in atoms]
    order += sorted(e for e in atoms if e not in order)
    return "".join(f"{e}{atoms[e] if atoms[e] != 1 else ''}" for e in order)


@functools.lru_cache(maxsize=256)
def _molecule(smiles: str) -> Molecule | None:
    try:
        return parse_smiles(smiles)
    except ValueError:
        return None


@guard
def le_bas_volume(atoms: Mapping[str, int], smiles: str | None = None) -> float:
    r"""Molar volume at the normal boiling point by the Le Bas additive method.

    .. math:: V_b = \sum_i n_i v_i + \sum_{\mathrm{rings}} \Delta v_{\mathrm{ring}}

    Parameters
    ----------
    atoms : mapping of str to int
        Atom counts [-], e.g. ``{"C": 2, "H": 6, "O": 1}``.
    smiles : str, optional
        SMILES string; when given, oxygen and nitrogen are classed by their
        bonding (acid, ether, amine) and ring increments are applied.

    Returns
    -------
    float
        Molar volume [m^3/mol].

    Notes
    -----
    Le Bas volumes agree with measured boiling-point volumes to about 4 %
    for ordinary organic liquids (Reid, Prausnitz & Sherwood, 3rd ed.,
    Section 3-11); they are poor for small, strongly associated molecules
    (water: 14.8 against a measured 18.9 cm^3/mol).

    References
    ----------
    Le Bas, G. (1915). *The Molecular Volumes of Liquid Chemical Compounds*.
    Longmans, London. Table as in Reid, Prausnitz & Sherwood (1977), *The
    Properties of Gases and Liquids*, 3rd ed., Table 3-8.

    Examples
    --------
    >>> round(le_bas_volume({"C": 7, "H": 8}, "CC1=CC=CC=C1") * 1e6, 1)
    118.2

    """
    table = data.LE_BAS_ATOMIC_VOLUMES
    mol = check_structure(atoms, smiles)
    total = 0.0
    classed: dict[str, int] = {}
    if mol is not None:
        for i, el in enumerate(mol.elements):
            if el in ("O", "N"):
                key = _le_bas_class(mol, i)
                classed[el] = classed.get(el, 0) + 1
                total += table[key]
        for ring in mol.rings:
            total += data.LE_BAS_RING_INCREMENTS.get(ring.size, 0.0)
    for el, n in atoms.items():
        n_left = n - classed.get(el, 0)
        if n_left <= 0:
            continue
        if el not in table:
            raise MissingConstantError(
                f"the Le Bas method has no volume for element {el!r}; supply Vb to the Species by hand"
            )
        total += n_left * table[el]
    return total * 1e-6


def _le_bas_class(mol: Molecule, i: int) -> str:
    el = mol.elements[i]
    nbrs = mol.neighbours(i)
    if el == "O":
        if any(mol.elements[j] in ("S", "P", "N") for j, _ in nbrs):
            return "O_to_SPN"
        carbons = [j for j, o in nbrs if mol.elements[j] == "C" and o == 1.0]
        # carboxylic acid: O on a carbon that also carries =O, and O is -OH
        # (one heavy neighbour) or the carbonyl O of such a group
        for j, _ in nbrs:
            if mol.elements[j] != "C":
                continue
            cn = mol.neighbours(j)
            has_dbl_o = any(mol.elements[k] == "O" and o == 2.0 for k, o in cn)
            single_os = [k for k, o in cn if mol.elements[k] == "O" and o == 1.0]
            if has_dbl_o and any(len(mol.neighbours(k)) == 1 for k in single_os):
                return "O_acid"
        if len(carbons) == 2:
            sizes = [_chain_length(mol, j, i) for j in carbons]
            if min(sizes) == 1:
                return "O_methyl_ether"
            if min(sizes) == 2:
                return "O_ethyl_ether"
            return "O_higher_ether"
        return "O"
    # nitrogen
    if any(o >= 1.5 for _, o in nbrs):
        return "N"
    if len(nbrs) == 1:
        return "N_primary_amine"
    return "N_secondary_amine"


def _chain_length(mol: Molecule, start: int, exclude: int) -> int:
    """Heavy atoms reachable from ``start`` without passing ``exclude``."""
    seen = {exclude, start}
    frontier = [start]
    while frontier:
        nxt = []
        for a in frontier:
            for b, _ in mol.neighbours(a):
                if b not in seen:
                    seen.add(b)
                    nxt.append(b)
        frontier = nxt
    return len(seen) - 1


@guard(check_output=False)  # a Species validates its own constants; reading them all would load
def species(identifier: str | Species) -> Species:
    """Resolve a species by name, CAS number or formula (cached).

    Parameters
    ----------
    identifier : str or Species
        A name (``"toluene"``), CAS number (``"108-88-3"``), formula
        (``"C7H8"``), the pseudo-species ``"air"``, or a :class:`Species`,
        which is returned unchanged.

    Returns
    -------
    Species
        The resolved, frozen record.  The second call with the same string
        returns the cached record in about a microsecond.

    Raises
    ------
    UnknownSpeciesError
        If ``chemicals`` does not know the identifier.

    Notes
    -----
    Lennard-Jones parameters are Svehla's (1962) where tabulated, else
    estimated from critical constants (Tee, Gotoh & Stewart 1966); the
    molar volume at the boiling point is ``thermo``'s, else Le Bas'.  The
    origin of each constant is recorded in ``Species.sources``.

    References
    ----------
    Bell, C. et al. chemicals: Chemical properties component of the
    Chemical Engineering Design Library. https://github.com/CalebBell/chemicals

    Svehla, R. A. (1962). Estimated viscosities and thermal conductivities of
    gases at high temperatures. NASA Technical Report R-132.

    Examples
    --------
    >>> tol = species("toluene")
    >>> tol.CAS, round(tol.molar_mass * 1000, 2)
    ('108-88-3', 92.14)

    """
    if isinstance(identifier, Species):
        return identifier
    if not isinstance(identifier, str):
        raise InputTypeError(
            f"species={identifier!r} is a {type(identifier).__name__}, neither a name, CAS number or "
            "formula string nor a Species; pass a string such as 'toluene' or build masstransfer.Species(...)"
        )
    text = identifier.strip()
    if not (any(ch.isalpha() for ch in text) or _CAS_PATTERN.fullmatch(text)):
        # blank, punctuation or bare digits: the databases would match them to unrelated entries
        raise UnknownSpeciesError(
            f"species={identifier!r} is not a name, CAS number or formula; pass a name such as "
            "'toluene' or a CAS number such as '108-88-3', or build it by hand: "
            "masstransfer.Species(name=..., molar_mass=..., ...)"
        )
    known_bad = _UNKNOWN.get(text)
    if known_bad is not None:  # remembered for the life of the process: a repeat costs nothing
        raise UnknownSpeciesError(known_bad)
    try:
        sp = _resolve(text)
    except UnknownSpeciesError as exc:
        if len(_UNKNOWN) >= _UNKNOWN_LIMIT:
            _UNKNOWN.pop(next(iter(_UNKNOWN)))
        _UNKNOWN[text] = str(exc)
        raise
    message = _ambiguity(text, sp)
    if message is not None:
        warn_caller(message, AmbiguousSpeciesWarning)
    return sp


def _ambiguous_key(text: str) -> str | None:
    """Return the key of :data:`_names.AMBIGUOUS` that ``text`` falls under, or None.

    A generic name by its text; a formula (also a condensed one such as ``C3H7OH``, unless the
    alias table names its substance) by its Hill formula.
    """
    key = text.lower()
    if key in _names.AMBIGUOUS:
        return key
    if text.upper() in _names.ALIASES or not _FORMULA.fullmatch(text):
        return None
    atoms = _formula_atoms(text)
    if not atoms:
        return None
    hill = _hill(atoms).lower()
    return hill if hill in _names.AMBIGUOUS else None


def _ambiguity(text: str, sp: Species) -> str | None:
    """Return the warning for an identifier that names several substances, or None."""
    key = _ambiguous_key(text)
    if key is None:
        return None
    alternatives = _names.AMBIGUOUS[key]
    others = ", ".join(f"{n} ({c})" for n, c in alternatives if c != sp.CAS)
    return (
        f"species {text!r} names several substances; it was resolved to {sp.identity}. "
        f"Others it may mean: {others}. Pass the name or CAS number of the one you mean."
    )


def ambiguity_warnings(*identifiers: object) -> tuple[str, ...]:
    """Return the ambiguity warnings that resolving ``identifiers`` issues (for caching callers).

    A dispatcher that keeps its preparation per identifier does not call :func:`species` again;
    it stores these messages with its entry and re-issues them on every call
    (:func:`rewarn_ambiguity`), so each call using an ambiguous name warns, whatever came first.
    """
    out = []
    for identifier in identifiers:
        if isinstance(identifier, str):
            text = identifier.strip()
            if _ambiguous_key(text) is not None:
                message = _ambiguity(text, _resolve(text))
                if message is not None:
                    out.append(message)
    return tuple(out)


def rewarn_ambiguity(messages: tuple[str, ...]) -> None:
    """Issue stored ambiguity warnings again, attributed to the caller's code."""
    for message in messages:
        warn_caller(message, AmbiguousSpeciesWarning)


#: Identifiers found to be unknown, with their message (bounded; oldest forgotten first).
_UNKNOWN: dict[str, str] = {}
_UNKNOWN_LIMIT = 4096


def suggestions(text: str, n: int = 4) -> list[str]:
    """Everyday names and plant abbreviations close to ``text`` (for error messages).

    Names that begin with ``text`` as a whole word come first ("acetic" -> "acetic acid"), then
    names that begin with it ("chlorob" -> "chlorobenzene"), then close spellings ("tolune").
    """
    vocabulary = {name.lower(): name for name in _names.COMMON_NAMES}
    vocabulary.update({key.lower(): key for key in _names.ALIASES})
    query = text.strip().lower()
    hits: list[str] = []
    if len(query) >= 3:
        hits += sorted(v for v in vocabulary if v.startswith((query + " ", query + "-")))
        hits += sorted(v for v in vocabulary if v.startswith(query) and v != query and v not in hits)
    hits += [h for h in difflib.get_close_matches(query, list(vocabulary), n=n, cutoff=0.75) if h not in hits]
    return [vocabulary[h] for h in hits[:n]]


def _unknown(text: str, why: str) -> UnknownSpeciesError:
    close = suggestions(text)
    hint = f"did you mean {', '.join(repr(c) for c in close)}? " if close else ""
    return UnknownSpeciesError(
        f"species {text!r} {why}; {hint}check the spelling, pass the full name or the substance's "
        "CAS number, or build it by hand: masstransfer.Species(name=..., molar_mass=... [kg/mol], "
        "formula=... or smiles=..., and the constants your method needs)"
    )


@functools.lru_cache(maxsize=1024)
def _resolve(key: str) -> Species:
    if key.lower() in _AIR_NAMES:
        return _air()
    alias = _names.ALIASES.get(key.upper())
    unclear = _names.UNCLEAR_ABBREVIATIONS.get(key.upper())
    if unclear is not None:
        raise _unknown(
            key,
            "is an abbreviation that means different substances in different trades ("
            + ", ".join(f"{n}, CAS {c}" for n, c in unclear)
            + "), so it was not guessed; pass the full name or the CAS number",
        )
    generic = _names.UNCLEAR_NAMES.get(key.lower())
    if generic is not None:
        usage, members = generic
        raise UnknownSpeciesError(
            f"species {key!r} is a generic name that means different substances in different "
            f"trades ({usage}): "
            + "; ".join(f"{n}, CAS {c}" for n, c in members)
            + "; it was not guessed: pass the full name, the abbreviation or the CAS number"
        )
    atom = _names.BARE_ATOMS.get(key) or _names.BARE_ATOMS.get(key.capitalize() if key.isupper() else "")
    if atom is not None:
        meant, atom_cas = atom
        raise UnknownSpeciesError(
            f"species {key!r} is the symbol of the free atom, a radical no process stream carries, "
            f"so it was not used; you probably mean {meant}: pass that name or CAS number (the "
            f"free atom itself is CAS {atom_cas})"
        )
    m = _names.CAS_PREFIX.match(key)
    ambiguous = _ambiguous_key(key)
    preferred = _names.AMBIGUOUS_DEFAULTS.get(ambiguous) if ambiguous is not None else None
    query = alias or (m.group(1) if m else preferred or key)
    with loading():
        return _lookup(query, original=key)


_FORMULA = re.compile(r"(?:[A-Z][a-z]?\d*)+")
_PLAIN = re.compile(r"[^a-z0-9]")


def _norm(text: str) -> str:
    return _PLAIN.sub("", text.lower())


class _Meta(NamedTuple):
    """What identifies a database species, kept for reading its constants later."""

    CAS: str
    MW: float
    formula: str | None
    smiles: str | None
    name: str


def _lookup(key: str, original: str | None = None) -> Species:
    from chemicals.identifiers import search_chemical

    shown = original or key
    meta = None
    for query in dict.fromkeys((key, key.lower())):  # "N-methyl-2-pyrrolidone" is found lower-cased
        try:
            candidate = search_chemical(query)
        except Exception:
            continue
        if _plausible(key, candidate):
            meta = candidate
            break
        if meta is None:
            meta = candidate  # kept to name it in the error
    if meta is None:
        raise _unknown(shown, "is not known to the chemicals database")
    if _abbreviation_guess(key, meta):
        raise _unknown(
            shown,
            f"looks like an abbreviation the library does not know; the database's synonyms give "
            f"{meta.common_name!r} (CAS {meta.CASs}, {meta.formula}), which need not be what your "
            "trade means by it, so it was not used; pass the full name or the CAS number",
        )
    if not _plausible(key, meta):
        raise _unknown(
            shown,
            f"matched only {meta.common_name!r} (CAS {meta.CASs}, {meta.formula}), whose names do "
            "not include it, so it was not used",
        )
    return _lazy_species(
        _Meta(
            CAS=str(meta.CASs),
            MW=float(meta.MW),
            formula=meta.formula or None,
            smiles=meta.smiles or None,
            name=_display_name(str(meta.CASs), str(meta.common_name or meta.CASs)),
        )
    )


#: Locants in a database name typed lower case: "n,n-" for N,N- (also O,O-, S,S-, N,N'-).
_MULTI_LOCANT = re.compile(r"(?<![A-Za-z])([nos]'*(?:,[nos]'*)+)(?=-)")
#: A single "n-" before a substituent with no straight-chain isomer ("n-methyl...", "n-tert-butyl",
#: "n-(2-chloroethyl)") is the N locant; before "butyl", "propyl" or an alkane it means normal
#: (n-butanol, n-hexane) and stays lower case.
_N_LOCANT = re.compile(
    r"(?<![A-Za-z])n(?=-(?:\(|methyl|ethyl|phenyl|vinyl|acetyl|formyl|benzyl|hydroxy|nitroso|"
    r"cyclohexyl|allyl|chloro|bromo|amino|oxide|tert-|sec-|iso))"
)


def _display_name(cas: str, name: str) -> str:
    """Return the name shown for a database species: its everyday form, locants in capitals."""
    fixed = _names.DISPLAY_NAMES.get(cas)
    if fixed is not None:
        return fixed
    name = _MULTI_LOCANT.sub(lambda m: m.group(1).upper(), name)
    return _N_LOCANT.sub("N", name)


#: Shorthand: two to four capitals ("BZ", "TEA", "LPG"), or up to six letters mixing two or more
#: capitals with lower case ("AcOH", "PhOH"). All-capital words of five or six letters are
#: taken as names typed in capitals ("STEAM", "ETHER").
_ABBREVIATION = re.compile(r"[A-Z]{2,4}|(?=(?:[^A-Z]*[A-Z]){2})(?=.*[a-z])[A-Za-z]{3,6}")


def _same_formula_any_case(query: str, formula: str) -> bool:
    """Whether ``query`` is ``formula`` written in any letter case ("HCL" for ClH, "NACL")."""
    atoms = _formula_atoms(formula)
    if not atoms:
        return False
    symbols = sorted(atoms, key=len, reverse=True)
    pattern = "|".join(re.escape(e.upper()) for e in symbols)
    parts = re.findall(rf"({pattern})(\d*)", query.upper())
    if "".join(e + n for e, n in parts) != query.upper():
        return False
    counts: dict[str, int] = {}
    by_upper = {e.upper(): e for e in symbols}
    for e, n in parts:
        counts[by_upper[e]] = counts.get(by_upper[e], 0) + (int(n) if n else 1)
    return counts == atoms


def _abbreviation_guess(query: str, meta: Any) -> bool:
    """Whether ``meta`` was found only through a synonym for what looks like an abbreviation.

    Abbreviations mean different substances in different trades, and the database's synonym
    lists mix them ("BZ", "TEA", "PG"); only those in the alias table are trusted.  A formula
    that matches the hit's formula in any letter case ("CS2", "HCL") and the hit's own name in
    capitals pass.
    """
    if not _ABBREVIATION.fullmatch(query) or _ambiguous_key(query) is not None:
        return False
    if _same_formula_any_case(query, str(meta.formula or "")):
        return False
    own = {_norm(str(n)) for n in (meta.common_name, meta.iupac_name) if n}
    return _norm(query) not in own


def _plausible(query: str, meta: Any) -> bool:
    """Whether a database hit is what the query names: its CAS, formula, or one of its names."""
    if _CAS_PATTERN.fullmatch(query):
        return str(meta.CASs) == query
    lowered = query.lower()
    if lowered.startswith(("inchi=", "inchikey=", "pubchem=", "smiles=")):
        return True
    formula = str(meta.formula or "")
    charged = any(ch in formula for ch in "+-")
    words = [w for w in re.split(r"[\s,()-]+", query) if sum(ch.isalpha() for ch in w) >= 2]
    if len(words) >= 2 and (charged or len(_formula_atoms(formula)) <= 1):
        return False  # an element, ion or radical for a multi-word name
    if (
        _FORMULA.fullmatch(query)
        and _formula_atoms(query)
        and _formula_atoms(query) == _formula_atoms(formula)
    ):
        return True
    names = [meta.common_name, meta.iupac_name, *(meta.synonyms or ())]
    return _norm(query) in {_norm(str(n)) for n in names if n}


#: Constants read in the first stage of a database species (``chemicals`` tables only); any
#: other field not known at creation (the liquid volume, the sources) completes the record.
_STAGE_A = frozenset(
    {"Tb", "Tm", "Tc", "Pc", "Vc", "omega", "sigma", "epsilon_k", "dipole", "parachor", "sources", "origins"}
)
#: Mappings that the first stage fills without the liquid volume; the second stage replaces them.
_RESTATED = ("sources", "origins")


#: Source texts of a database species' identity constants.
_FROM_CHEMICALS = "chemicals"
_FULLER_SPECIAL = "Fuller et al. (1969) special-molecule volume"


def _lazy_species(meta: _Meta) -> Species:
    """Create a database species whose constants are read from the databases on first use.

    ``import masstransfer; gas_diffusivity("toluene", "air", 300.0)`` needs only the formula and
    structure (Fuller); the critical constants, Lennard-Jones parameters and the liquid volume
    at the boiling point (``thermo``'s liquid-volume data, the slowest to load) are read from the
    databases the first time any of them is asked for.  The record behaves as an ordinary frozen
    :class:`Species` in every other way.
    """
    sp = object.__new__(Species)
    atoms = _formula_atoms(meta.formula) if meta.formula else {}
    fuller_v = data.FULLER_SPECIAL_VOLUMES.get(meta.CAS)
    eager: dict[str, Any] = {
        "name": meta.name,
        "molar_mass": meta.MW / 1000.0,
        "CAS": meta.CAS,
        "formula": meta.formula,
        "smiles": meta.smiles,
        "atoms": FrozenMap(atoms),
        "fuller_volume": fuller_v,
    }
    for k, v in eager.items():
        object.__setattr__(sp, k, v)
    # the sources of the identity constants, the same as the completed record states, so that a
    # method using only these does not read the other constants to report where they came from
    early = {"molar_mass": (_FROM_CHEMICALS, Origin.DATABASE)}
    if fuller_v is not None:
        early["fuller_volume"] = (_FULLER_SPECIAL, Origin.TABULATED)
    object.__setattr__(sp, "_early_sources", early)
    object.__setattr__(sp, "_pending", meta)
    return sp


def _complete(sp: Species, *, stage_a: bool) -> None:
    """Read the remaining constants of a lazily created database species (thread-safe)."""
    with loading():
        d = object.__getattribute__(sp, "__dict__")
        meta = d.get("_pending")
        if meta is None:
            return
        full = _from_chemicals(meta, with_vb=not stage_a)
        names = _STAGE_A if stage_a else [f.name for f in dataclasses.fields(Species)]
        for name in names:
            if name not in d or (not stage_a and name in _RESTATED):
                object.__setattr__(sp, name, getattr(full, name))
        if all(f.name in d for f in dataclasses.fields(Species)):
            del d["_pending"]
            d.pop("_early_sources", None)


@functools.lru_cache(maxsize=1)
def _air() -> Species:
    a = data.AIR
    src = "masstransfer._tables.AIR (see its sources)"
    return Species(
        name="air",
        molar_mass=float(a["molar_mass"]),  # type: ignore[arg-type]
        CAS=None,
        formula=None,
        Tb=float(a["Tb"]),  # type: ignore[arg-type]
        Tc=float(a["Tc"]),  # type: ignore[arg-type]
        Pc=float(a["Pc"]),  # type: ignore[arg-type]
        omega=float(a["omega"]),  # type: ignore[arg-type]
        sigma=float(a["sigma"]),  # type: ignore[arg-type]
        epsilon_k=float(a["epsilon_k"]),  # type: ignore[arg-type]
        dipole=float(a["dipole"]),  # type: ignore[arg-type]
        Vb=float(a["Vb"]),  # type: ignore[arg-type]
        fuller_volume=data.FULLER_SPECIAL_VOLUMES["air"],
        sources={
            **dict.fromkeys(("molar_mass", "Tb", "Tc", "Pc", "omega", "sigma", "epsilon_k", "Vb"), src),
            "fuller_volume": "Fuller et al. (1969) special-molecule volume",
        },
        origins=dict.fromkeys(_CONSTANT_FIELDS, Origin.TABULATED),
    )


def _opt(value: Any) -> float | None:
    if value is None:
        return None
    try:
        v = float(value)
    except (TypeError, ValueError):
        return None
    return v if math.isfinite(v) and v > 0 else None


def _from_chemicals(meta: _Meta, with_vb: bool = True) -> Species:
    import chemicals

    cas: str = meta.CAS
    src: dict[str, str] = {}
    mw = float(meta.MW) / 1000.0
    src["molar_mass"] = _FROM_CHEMICALS

    def get(fn: Any, name: str) -> float | None:
        try:
            v = _opt(fn(cas))
        except Exception:
            v = None
        if v is not None:
            src[name] = "chemicals"
        return v

    Tb = get(chemicals.Tb, "Tb")
    Tm = get(chemicals.Tm, "Tm")
    Tc = get(chemicals.Tc, "Tc")
    Pc = get(chemicals.Pc, "Pc")
    Vc = get(chemicals.Vc, "Vc")
    try:
        omega_raw = chemicals.omega(cas)
        omega = None if omega_raw is None else float(omega_raw)
    except Exception:
        omega = None
    if omega is not None:
        src["omega"] = "chemicals"
    try:
        mu_d = chemicals.dipole_moment(cas)
        dipole = None if mu_d is None else float(mu_d) * DEBYE
    except Exception:
        dipole = None
    if dipole is not None:
        src["dipole"] = "chemicals"  # zero is kept as zero: None means unknown

    org: dict[str, Origin] = {}
    eps, sig_a = _lennard_jones(cas, Tc, Pc, omega, src, org)
    sigma = None if sig_a is None else sig_a * 1e-10

    formula = meta.formula
    smiles = meta.smiles or None
    atoms = _formula_atoms(formula) if formula else {}

    Vb = _vb_from_thermo(cas, mw, Tb, Tc, Pc, Vc, omega, dipole) if with_vb else None
    if Vb is not None:
        src["Vb"] = "thermo VolumeLiquid at Tb"
    elif with_vb and atoms:
        try:
            Vb = le_bas_volume(atoms, smiles if smiles and _molecule(smiles) is not None else None)
            src["Vb"] = "Le Bas additive volumes"
            org["Vb"] = Origin.ESTIMATED
        except (MissingConstantError, InputValueError):
            Vb = None

    fuller_v = data.FULLER_SPECIAL_VOLUMES.get(cas)
    if fuller_v is not None:
        src["fuller_volume"] = _FULLER_SPECIAL
        org["fuller_volume"] = Origin.TABULATED

    return Species(
        name=meta.name,
        molar_mass=mw,
        CAS=cas,
        formula=formula,
        smiles=smiles,
        atoms=atoms,
        Tb=Tb,
        Tm=Tm,
        Tc=Tc,
        Pc=Pc,
        Vc=Vc,
        omega=omega,
        sigma=sigma,
        epsilon_k=eps,
        dipole=dipole,
        Vb=Vb,
        fuller_volume=fuller_v,
        sources=src,
        origins={**dict.fromkeys(src, Origin.DATABASE), **org},
    )


_LJ_TABLE = "Poling et al. (2001)"
_LJ_EPS_CSP = "Tee, Gotoh, and Stewart CSP with Tc, omega (1966)"
_LJ_SIG_CSP = "Tee, Gotoh, and Stewart CSP with Tc, Pc, omega (1966)"


def _lennard_jones(
    cas: str,
    Tc: float | None,
    Pc: float | None,
    omega: float | None,
    src: dict[str, str],
    org: dict[str, Origin] | None = None,
) -> tuple[float | None, float | None]:
    """Lennard-Jones (epsilon/k [K], sigma [angstrom]) for Chapman-Enskog use.

    The viscosity-derived values of Svehla (1962) as reprinted by Poling,
    Prausnitz & O'Connell (2001), Appendix B, are taken from ``chemicals``
    when it has them.  Otherwise both come, as a consistent pair, from the
    corresponding-states relations of Tee, Gotoh & Stewart (1966).  The
    other tabulated set in ``chemicals`` (Magalhaes et al., 2013) belongs to
    a different diffusion model and is not used here.
    """
    import chemicals

    try:
        eps = _opt(chemicals.Stockmayer(CASRN=cas, method=_LJ_TABLE))
        sig = _opt(chemicals.molecular_diameter(CASRN=cas, method=_LJ_TABLE))
    except Exception:
        eps = sig = None
    if eps is not None and sig is not None:
        src["epsilon_k"] = src["sigma"] = "chemicals: " + _LJ_TABLE + " (Svehla 1962)"
        if org is not None:
            org["epsilon_k"] = org["sigma"] = Origin.TABULATED
        return eps, sig
    if Tc is None or Pc is None or omega is None:
        return None, None
    try:
        eps = _opt(chemicals.Stockmayer(Tc=Tc, omega=omega, method=_LJ_EPS_CSP))
        sig = _opt(chemicals.molecular_diameter(Tc=Tc, Pc=Pc, omega=omega, method=_LJ_SIG_CSP))
    except Exception:
        return None, None
    if eps is None or sig is None:
        return None, None
    src["epsilon_k"] = src["sigma"] = "chemicals: estimated, " + _LJ_SIG_CSP
    if org is not None:
        org["epsilon_k"] = org["sigma"] = Origin.ESTIMATED
    return eps, sig


def _vb_from_thermo(
    cas: str,
    mw: float,
    Tb: float | None,
    Tc: float | None,
    Pc: float | None,
    Vc: float | None,
    omega: float | None,
    dipole: float | None,
) -> float | None:
    if Tb is None:
        return None
    try:
        from thermo import VolumeLiquid

        with thermo_models():
            vl = VolumeLiquid(
                CASRN=cas,
                MW=mw * 1000.0,
                Tb=Tb,
                Tc=Tc,
                Pc=Pc,
                Vc=Vc,
                omega=omega,
                dipole=None if dipole is None else dipole / DEBYE,
            )
        if vl.method is None:
            return None
        low, high = vl.T_limits[vl.method]
        if not (low <= Tb <= high):
            return None
        return _opt(vl.T_dependent_property(Tb))
    except Exception:
        return None


#: ``chemicals`` boiling-point sources that hold evaluated, measured values (the CRC Handbook
#: tables, the NIST WebBook, CoolProp's reference fluids).  Its other sources (CAS Common
#: Chemistry, Yaws, Wikidata, the Joback estimate) also carry estimates and decomposition
#: temperatures for substances that never boil at 1 atm.
_MEASURED_TB_SOURCES = frozenset({"CRC_ORG", "CRC_INORG", "WEBBOOK", "HEOS"})


@functools.lru_cache(maxsize=1024)
def _tb_sources(cas: str) -> tuple[str, ...]:
    import chemicals

    with loading():
        try:
            return tuple(str(m) for m in chemicals.Tb_methods(cas))
        except Exception:  # no entry: nothing is known of its boiling point
            return ()


def boiling_point_measured(sp: Species) -> bool | None:
    """Whether a species' normal boiling point is a measured value: None where it cannot be told.

    A user-supplied boiling point counts as measured.  A database species' counts as measured
    when one of the evaluated tables of ``chemicals`` (CRC Handbook, NIST WebBook, CoolProp
    fluids) holds it; otherwise the value may be an estimate or a decomposition temperature
    (urea decomposes before it boils), and False is returned.
    """
    if sp.Tb is None:
        return None
    if sp.origins.get("Tb") is Origin.USER or not sp.CAS:
        return True if sp.origins.get("Tb") is Origin.USER else None
    return bool(set(_tb_sources(sp.CAS)) & _MEASURED_TB_SOURCES)
