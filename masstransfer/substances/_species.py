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
import enum
import functools
import math
import re
from collections.abc import Mapping
from dataclasses import dataclass, field
from typing import Any

from .. import _tables as data
from .._validation import guard
from ..constants import DEBYE
from ..errors import InputTypeError, InputValueError, MissingConstantError, UnknownSpeciesError
from ._databases import quiet
from ._structure import Molecule, parse_smiles

__all__ = ["Origin", "Species", "le_bas_volume", "species"]


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
    atoms: Mapping[str, int] = field(default_factory=dict, compare=False, hash=False)
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
    sources: Mapping[str, str] = field(default_factory=dict, compare=False, hash=False)
    origins: Mapping[str, Origin] = field(default_factory=dict, hash=False)

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
        if not self.atoms and self.formula:
            from chemicals.elements import simple_formula_parser

            try:
                counts = simple_formula_parser(self.formula)
            except Exception:
                counts = {}
            object.__setattr__(self, "atoms", dict(counts))
        object.__setattr__(self, "atoms", dict(self.atoms))
        object.__setattr__(self, "sources", dict(self.sources))
        given = dict(self.origins)
        origins = {n: given.get(n, Origin.USER) for n in _CONSTANT_FIELDS if getattr(self, n) is not None}
        object.__setattr__(self, "origins", origins)

    @property
    def molecule(self) -> Molecule | None:
        """The heavy-atom graph read from :attr:`smiles`, or None."""
        if not self.smiles:
            return None
        return _molecule(self.smiles)

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


@functools.lru_cache(maxsize=256)
def _molecule(smiles: str) -> Molecule | None:
    try:
        return parse_smiles(smiles)
    except ValueError:
        return None


@guard
def le_bas_volume(atoms: Mapping[str, int], smiles: str | None = None) -> float:
    """Molar volume at the normal boiling point by the Le Bas additive method.

    .. math:: V_b = \\sum_i n_i v_i + \\sum_{\\mathrm{rings}} \\Delta v_{\\mathrm{ring}}

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
    mol = _molecule(smiles) if smiles else None
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


@guard
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
    return _resolve(text)


@functools.lru_cache(maxsize=1024)
def _resolve(key: str) -> Species:
    if key.lower() in _AIR_NAMES:
        return _air()
    with quiet():
        return _lookup(key)


def _lookup(key: str) -> Species:
    from chemicals.identifiers import search_chemical

    try:
        meta = search_chemical(key)
    except Exception:
        raise UnknownSpeciesError(
            f"species {key!r} is not known to the chemicals database; check the spelling or "
            "pass a CAS number, or build it by hand: masstransfer.Species(name=..., "
            "molar_mass=... [kg/mol], Tb=..., Vb=..., ...) with the constants your method needs"
        ) from None
    return _from_chemicals(meta)


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


def _from_chemicals(meta: Any) -> Species:
    import chemicals

    cas: str = meta.CASs
    src: dict[str, str] = {}
    mw = float(meta.MW) / 1000.0
    src["molar_mass"] = "chemicals"

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
    try:
        from chemicals.elements import simple_formula_parser

        atoms = dict(simple_formula_parser(formula)) if formula else {}
    except Exception:
        atoms = {}

    Vb = _vb_from_thermo(cas, mw, Tb, Tc, Pc, Vc, omega, dipole)
    if Vb is not None:
        src["Vb"] = "thermo VolumeLiquid at Tb"
    elif atoms:
        try:
            Vb = le_bas_volume(atoms, smiles)
            src["Vb"] = "Le Bas additive volumes"
            org["Vb"] = Origin.ESTIMATED
        except MissingConstantError:
            Vb = None

    fuller_v = data.FULLER_SPECIAL_VOLUMES.get(cas)
    if fuller_v is not None:
        src["fuller_volume"] = "Fuller et al. (1969) special-molecule volume"
        org["fuller_volume"] = Origin.TABULATED

    return Species(
        name=str(meta.common_name or cas),
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
