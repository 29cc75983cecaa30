"""A small SMILES reader: just enough structure for group-contribution volumes.

It reads the atoms, bonds, branches and ring closures of the SMILES strings
that ``chemicals`` carries (Kekule or aromatic lower-case form), and reports
each ring (its size, whether it is aromatic, whether it holds a heteroatom)
and, for every atom, its heavy-atom neighbours and bond orders.  It is not a
general cheminformatics parser: stereo marks are ignored and charges are
kept only as part of a bracket atom's text.
"""

from __future__ import annotations

import re
from collections import deque
from dataclasses import dataclass

__all__ = ["Molecule", "Ring", "parse_smiles"]

_TOKEN = re.compile(
    r"(\[[^\]]+\])|(Br|Cl|B|C|N|O|P|S|F|I|b|c|n|o|p|s)|(%\d\d|\d)|([-=#:$/\\.])|(\()|(\))|(\*)"
)
_BOND_ORDER = {"-": 1.0, "=": 2.0, "#": 3.0, "$": 4.0, ":": 1.5, "/": 1.0, "\\": 1.0}
_BRACKET_ELEMENT = re.compile(r"\[\d*([A-Z][a-z]?|[bcnops]|se|as)")
_BRACKET_H = re.compile(r"H(\d*)")
#: Usual valences of the organic subset, lowest first (implicit hydrogens fill up to the first
#: that the bonds do not exceed); OpenSMILES specification, section 3.1.5 (common practice).
_VALENCES = {"B": (3,), "C": (4,), "N": (3, 5), "O": (2,), "P": (3, 5), "S": (2, 4, 6),
             "F": (1,), "Cl": (1,), "Br": (1,), "I": (1,)}  # fmt: skip


@dataclass(frozen=True)
class Ring:
    """One ring of a molecule: its size and kind."""

    size: int
    aromatic: bool
    hetero: bool
    atoms: tuple[int, ...] = ()


@dataclass(frozen=True)
class Molecule:
    """Heavy-atom graph read from a SMILES string."""

    elements: tuple[str, ...]
    aromatic_atoms: tuple[bool, ...]
    bonds: dict[tuple[int, int], float]
    rings: tuple[Ring, ...]
    #: hydrogens written in a bracket atom (``[nH]``, ``[CH2]``); -1 where they are implicit
    explicit_h: tuple[int, ...] = ()

    def hydrogens(self, i: int) -> int:
        """Hydrogens on atom ``i``: written in its bracket, else implied by the usual valence."""
        if self.explicit_h and self.explicit_h[i] >= 0:
            return self.explicit_h[i]
        valences = _VALENCES.get(self.elements[i])
        if valences is None:
            return 0
        bonded = sum(o for _, o in self.neighbours(i))  # aromatic bonds count 1.5
        for v in valences:
            if v >= bonded:
                return round(v - bonded)
        return 0

    def atom_counts(self) -> dict[str, int]:
        """Atom counts, hydrogens included (a Hill-order-free mapping)."""
        counts: dict[str, int] = {}
        for i, el in enumerate(self.elements):
            counts[el] = counts.get(el, 0) + 1
            h = self.hydrogens(i)
            if h:
                counts["H"] = counts.get("H", 0) + h
        return counts

    def neighbours(self, i: int) -> list[tuple[int, float]]:
        """Heavy-atom neighbours of atom ``i`` with their bond orders."""
        out = []
        for (a, b), order in self.bonds.items():
            if a == i:
                out.append((b, order))
            elif b == i:
                out.append((a, order))
        return out


def _bond_key(a: int, b: int) -> tuple[int, int]:
    return (a, b) if a < b else (b, a)


def parse_smiles(smiles: str) -> Molecule:
    """Read ``smiles`` into a :class:`Molecule`.

    Raises
    ------
    ValueError
        If the string holds something this reader does not understand.

    """
    elements: list[str] = []
    aromatic: list[bool] = []
    explicit_h: list[int] = []
    bonds: dict[tuple[int, int], float] = {}
    closures: list[tuple[int, int]] = []
    open_rings: dict[str, tuple[int, float | None]] = {}
    stack: list[int] = []
    prev: int | None = None
    pending: float | None = None
    pos = 0
    for m in _TOKEN.finditer(smiles):
        if m.start() != pos:
            raise ValueError(f"cannot read SMILES {smiles!r} at position {pos}")
        pos = m.end()
        bracket, organic, ring, bond, lpar, rpar, star = m.groups()
        if bracket or organic or star:
            if bracket:
                em = _BRACKET_ELEMENT.match(bracket)
                if em is None:
                    raise ValueError(f"cannot read bracket atom {bracket!r} in {smiles!r}")
                sym = em.group(1)
                hm = _BRACKET_H.search(bracket[em.end() :].split("+")[0].split("-")[0])
                explicit_h.append(0 if hm is None else int(hm.group(1) or 1))
            else:
                sym = organic or "*"
                explicit_h.append(-1)
            is_arom = sym.islower()
            elements.append(sym.capitalize() if is_arom else sym)
            aromatic.append(is_arom)
            idx = len(elements) - 1
            if prev is not None:
                order = pending
                if order is None:
                    order = 1.5 if (is_arom and aromatic[prev]) else 1.0
                bonds[_bond_key(prev, idx)] = order
            prev, pending = idx, None
        elif ring:
            if prev is None:
                raise ValueError(f"ring label before any atom in {smiles!r}")
            if ring in open_rings:
                other, first_order = open_rings.pop(ring)
                order = pending if pending is not None else first_order
                if order is None:
                    order = 1.5 if (aromatic[other] and aromatic[prev]) else 1.0
                bonds[_bond_key(other, prev)] = order
                closures.append((other, prev))
            else:
                open_rings[ring] = (prev, pending)
            pending = None
        elif bond:
            pending = None if bond == "." else _BOND_ORDER[bond]
            if bond == ".":
                prev = None
        elif lpar:
            if prev is None:
                raise ValueError(f"branch before any atom in {smiles!r}")
            stack.append(prev)
        elif rpar:
            if not stack:
                raise ValueError(f"unbalanced ')' in {smiles!r}")
            prev = stack.pop()
    if pos != len(smiles) or open_rings or stack:
        raise ValueError(f"incomplete SMILES {smiles!r}")
    rings = tuple(_ring_for(a, b, elements, aromatic, bonds) for a, b in closures)
    return Molecule(tuple(elements), tuple(aromatic), bonds, rings, tuple(explicit_h))


def _ring_for(
    a: int,
    b: int,
    elements: list[str],
    aromatic: list[bool],
    bonds: dict[tuple[int, int], float],
) -> Ring:
    """Smallest ring through the closure bond a-b (breadth-first search)."""
    adj: dict[int, list[int]] = {}
    for x, y in bonds:
        if {x, y} == {a, b}:
            continue
        adj.setdefault(x, []).append(y)
        adj.setdefault(y, []).append(x)
    parent: dict[int, int | None] = {a: None}
    queue = deque([a])
    while queue:
        node = queue.popleft()
        if node == b:
            break
        for nxt in adj.get(node, []):
            if nxt not in parent:
                parent[nxt] = node
                queue.append(nxt)
    path = [b]
    while parent.get(path[-1]) is not None:
        nxt_parent = parent[path[-1]]
        assert nxt_parent is not None
        path.append(nxt_parent)
    atoms = set(path)
    ring_bonds = [o for (x, y), o in bonds.items() if x in atoms and y in atoms]
    hetero = any(elements[i] not in ("C", "*") for i in atoms)
    n_double = sum(1 for o in ring_bonds if o == 2.0)
    size = len(path)
    is_aromatic = all(aromatic[i] for i in atoms) or (
        (size == 6 and n_double >= 3) or (size == 5 and hetero and n_double >= 2)
    )
    return Ring(size=size, aromatic=is_aromatic, hetero=hetero, atoms=tuple(sorted(atoms)))
