"""The correlation record: one published equation, its envelope and its source."""

from __future__ import annotations

import inspect
import math
from collections.abc import Callable, Mapping
from dataclasses import dataclass, field
from typing import Any, Literal, NamedTuple

import numpy as np

from .._frozen import FrozenMapping, FrozenResult
from .._typing import FloatOrArray
from .._validation import _ARITHMETIC, MAGNITUDE_LIMIT, as_float, check_shapes, finish, guard, warn_caller
from ..errors import EnvelopeError, EnvelopeWarning, InputValueError

__all__ = ["Correlation", "CorrelationResult"]

Transport = Literal["heat", "mass", "both"]
Kind = Literal["heat", "mass"]

#: Inputs that must be strictly positive (the equations divide by them or take logs).
_STRICTLY_POSITIVE = frozenset({"Pr", "mu_ratio", "Pr_ratio", "porosity", "L_over_d", "Re_c"})
#: Parameter names of earlier versions, which wrote D for a diameter -> the present name.
_RENAMED = {
    "L_over_D": "L_over_d",
    "D_over_L": "d_over_L",
    "H_over_D": "H_over_d",
    "Di_over_Do": "di_over_do",
}

#: Names of the inputs in the heat form and the mass form.
_MASS_NAME = {"Pr": "Sc", "Nu": "Sh"}


class _Plan(NamedTuple):
    """The scalar fast path of one record in one form (heat or mass), declared once."""

    entries: tuple[tuple[str, float | None, float, float], ...]
    products: tuple[tuple[tuple[int, ...], float, float], ...]
    positional: bool
    keys: tuple[str, ...]
    usable: bool


@dataclass(frozen=True, eq=False)
class CorrelationResult(FrozenResult):
    """A correlation's value with the metadata a design note needs.

    Attributes
    ----------
    value : float or numpy.ndarray
        Nu (heat) or Sh (mass) [-].
    quantity : str
        ``"Nu"`` or ``"Sh"``.
    slug : str
        The record that produced it.
    inputs : mapping
        The inputs and parameters used, under the names of the chosen form.
    analogy : str or None
        Set when a record fitted on one kind of transport was used for the
        other (heat-mass analogy), saying so.
    warnings : tuple of str
        Envelope warnings raised by the evaluation.
    reference : str
        The source of the equation.
    accuracy : str
        The accuracy the source states.

    """

    value: FloatOrArray
    quantity: str
    slug: str
    inputs: Mapping[str, Any]
    analogy: str | None
    warnings: tuple[str, ...]
    reference: str
    accuracy: str


@dataclass(frozen=True, eq=False)
class Correlation:
    """A Nusselt/Sherwood correlation with its geometry, regime, envelope and source.

    The same record gives Nu from (Re, Pr) and Sh from (Re, Sc): the heat
    form's ``Pr`` is the mass form's ``Sc``.  Inputs are named as in the
    heat form in :attr:`inputs` and :attr:`envelope`.

    Attributes
    ----------
    slug : str
        Stable identifier, e.g. ``"sphere-ranz-marshall"``.
    title : str
        Human-readable name.
    geometry : str
        e.g. ``"flat plate"``, ``"sphere"``, ``"duct"``, ``"packed bed"``.
    convection : str
        ``"forced"``, ``"free"`` or ``"interfacial"``.
    regime : str
        ``"laminar"``, ``"turbulent"``, ``"mixed"``, ``"creeping"``, ``"all"``...
    length : str
        Definition of the characteristic length in Nu, Sh and Re.
    boundary : str
        Boundary condition the record holds for.
    inputs : tuple of str
        Dimensionless inputs (heat form names).
    parameters : mapping of str to float or None
        Optional or required named parameters with their defaults (None:
        required).
    envelope : mapping of str to (float, float)
        Ranges of inputs and parameters over which the source validated it.
    fitted_on : {'heat', 'mass', 'both'}
        The transport the data or theory behind it concerns.
    reference : str
        Authors, year, journal or book, equation number.
    accuracy : str
        The accuracy the source states.
    accuracy_pct : float or None
        The same as a number, used to rank :func:`find` results.
    notes : str
        Anything else a user must know.
    domain : mapping of str to (float, float)
        Ranges outside which the equation itself is undefined (an error,
        not a warning).
    products : mapping of str to (tuple of str, (float, float))
        Envelope conditions on products of inputs, e.g. ``{"Pe": (("Re",
        "Pr"), (100.0, inf))}`` for a condition Re Pr >= 100 stated by the
        source; leaving them warns like the envelope.
    branches : tuple of (str, float, float, mapping)
        Envelopes that hold on one branch only: ``(input, low, high,
        envelope)`` applies ``envelope`` where ``low <= input < high``
        (sources that fitted two regimes over different ranges).
    steps : tuple of (str, float, float)
        Documented jumps at regime switches, ``(input, value, jump_pct)``:
        the source switches equations at ``input = value`` without
        blending, and the value jumps by ``jump_pct`` per cent there.

    """

    slug: str
    title: str
    geometry: str
    convection: str
    regime: str
    length: str
    boundary: str
    inputs: tuple[str, ...]
    envelope: Mapping[str, tuple[float, float]]
    fitted_on: Transport
    reference: str
    accuracy: str
    function: Callable[..., Any] = field(repr=False)
    parameters: Mapping[str, float | None] = field(default_factory=dict)
    accuracy_pct: float | None = None
    notes: str = ""
    domain: Mapping[str, tuple[float, float]] = field(default_factory=dict)
    products: Mapping[str, tuple[tuple[str, ...], tuple[float, float]]] = field(default_factory=dict)
    branches: tuple[tuple[str, float, float, Mapping[str, tuple[float, float]]], ...] = ()
    steps: tuple[tuple[str, float, float], ...] = ()
    _plans: Mapping[str, _Plan] = field(init=False, repr=False, default_factory=dict)

    def __post_init__(self) -> None:
        object.__setattr__(self, "envelope", FrozenMapping(self.envelope))
        object.__setattr__(self, "parameters", FrozenMapping(self.parameters))
        object.__setattr__(self, "domain", FrozenMapping(self.domain))
        object.__setattr__(self, "products", FrozenMapping(self.products))
        object.__setattr__(
            self,
            "branches",
            tuple((k, float(lo), float(hi), FrozenMapping(env)) for k, lo, hi, env in self.branches),
        )
        # argument domains declared once: the scalar fast path reads these plans
        object.__setattr__(self, "_plans", {"heat": self._plan("heat"), "mass": self._plan("mass")})

    def __reduce__(self) -> tuple[Any, ...]:
        # A record is identified by its stable slug: it unpickles to the catalogue's own record.
        from ._lookup import correlation

        return (correlation, (self.slug,))

    def _plan(self, transport: Kind) -> _Plan:
        """Build the scalar fast path's plan for one form, once, from the declared domains.

        Per input: (name in this form, default, lowest, highest) accepted without a word, the
        range being the intersection of the domain, the strictly-positive rule, the magnitude
        limit and the envelope: a Python float inside it needs no error and no warning.  Then
        the products' conditions as positions, and whether the function takes the values in
        plan order (a positional call).
        """
        keys = (*self.inputs, *self.parameters)
        entries = []
        for key in keys:
            lo, hi = self.domain.get(key, (0.0, math.inf))
            if key in _STRICTLY_POSITIVE:
                lo = max(lo, 5e-324)
            hi = min(hi, MAGNITUDE_LIMIT)
            elo, ehi = self.envelope.get(key, (-math.inf, math.inf))
            default = self.parameters.get(key)
            entries.append(
                (
                    self._name(key, transport),
                    None if default is None else float(default),
                    max(lo, elo),
                    min(hi, ehi),
                )
            )
        products = tuple(
            (tuple(keys.index(n) for n in names), lo, hi) for names, (lo, hi) in self.products.values()
        )
        try:
            params = list(inspect.signature(self.function).parameters)
        except (TypeError, ValueError):  # pragma: no cover - builtins without a signature
            params = []
        return _Plan(tuple(entries), products, params == list(keys), keys, not self.branches)

    def _fast(self, transport: Kind, given: Mapping[str, Any]) -> float | None:
        """Return the value for Python-float inputs inside the envelope and domain, else None.

        None sends the call down the general path, which raises or warns exactly as it always
        does; this path only ever returns what that path would return, with nothing to say.
        """
        plan = self._plans[transport]
        if not plan.usable:
            return None
        values: list[float] = []
        used = 0
        for name, default, lo, hi in plan.entries:
            v = given.get(name)
            if v is None:
                if default is None:
                    return None
                v = default
            else:
                used += 1
                t = type(v)
                if t is int:
                    v = float(v)
                elif t is not float:
                    return None
            if not lo <= v <= hi:  # NaN fails too
                return None
            values.append(v)
        if used != len(given):
            return None
        for positions, lo, hi in plan.products:
            p = 1.0
            for k in positions:
                p *= values[k]
            if not lo <= p <= hi:
                return None
        try:
            out = (
                self.function(*values)
                if plan.positional
                else self.function(**dict(zip(plan.keys, values, strict=True)))
            )
        except _ARITHMETIC:
            return None
        if type(out) is not float:
            if isinstance(out, np.ndarray | np.floating) and np.ndim(out) == 0:
                out = float(out)
            else:
                return None
        return out if math.isfinite(out) else None

    # -- evaluation --------------------------------------------------------

    @guard(check_output=False)
    def nusselt(self, *, strict: bool = False, **inputs: Any) -> FloatOrArray:
        """Nusselt number from the heat-form inputs (e.g. ``Re=..., Pr=...``).

        Parameters
        ----------
        strict : bool
            Raise :class:`~masstransfer.errors.EnvelopeError` instead of
            warning when an input leaves the envelope.
        **inputs : float or array_like
            The record's inputs and parameters [-].

        Returns
        -------
        float or numpy.ndarray
            Nu [-].

        """
        fast = self._fast("heat", inputs)
        if fast is not None:
            return fast
        return self._compute("heat", strict, inputs)[2]  # the value alone: no result object to freeze

    @guard(check_output=False)
    def sherwood(self, *, strict: bool = False, **inputs: Any) -> FloatOrArray:
        """Sherwood number from the mass-form inputs (e.g. ``Re=..., Sc=...``).

        Parameters
        ----------
        strict : bool
            Raise instead of warning outside the envelope.
        **inputs : float or array_like
            The record's inputs, with ``Sc`` in place of ``Pr`` [-].

        Returns
        -------
        float or numpy.ndarray
            Sh [-].

        """
        fast = self._fast("mass", inputs)
        if fast is not None:
            return fast
        return self._compute("mass", strict, inputs)[2]  # the value alone: no result object to freeze

    @guard(check_output=False)
    def evaluate(
        self, transport: Kind, *, strict: bool = False, stacklevel: int = 2, **inputs: Any
    ) -> CorrelationResult:
        """Evaluate for heat or mass transfer and return the value with metadata.

        Parameters
        ----------
        transport : {'heat', 'mass'}
            ``'heat'`` gives Nu from Pr; ``'mass'`` gives Sh from Sc.
        strict : bool
            Raise instead of warning outside the envelope.
        stacklevel : int
            Passed to :func:`warnings.warn` (points at the caller).
        **inputs : float or array_like
            Inputs and parameters, named for the chosen form [-].

        Returns
        -------
        CorrelationResult
            Value, metadata and any envelope warnings.

        """
        values, messages, value = self._compute(transport, strict, inputs)
        analogy = None
        if self.fitted_on != "both" and self.fitted_on != transport:
            analogy = (
                f"{self.slug} was fitted on {self.fitted_on} transfer and is used here for {transport} "
                "transfer through the heat-mass analogy "
                f"({'Sc for Pr' if transport == 'mass' else 'Pr for Sc'})"
            )
        used = {self._name(k, transport): v for k, v in values.items()}
        return CorrelationResult(
            value=value,
            quantity="Nu" if transport == "heat" else "Sh",
            slug=self.slug,
            inputs=FrozenMapping(used),
            analogy=analogy,
            warnings=tuple(messages),
            reference=self.reference,
            accuracy=self.accuracy,
        )

    # -- helpers -------------------------------------------------------------

    def _compute(
        self, transport: Kind, strict: bool, inputs: dict[str, Any]
    ) -> tuple[dict[str, Any], list[str], FloatOrArray]:
        """Return the inputs as used, the envelope messages (already warned) and the value."""
        if transport not in ("heat", "mass"):
            raise InputValueError(f"transport={transport!r} must be 'heat' or 'mass'")
        values, extremes = self._collect(transport, inputs)
        messages = self._check_envelope(transport, values, extremes, strict)
        for msg in messages:
            warn_caller(msg, EnvelopeWarning)
        return values, messages, finish(np.asarray(self.function(**values), dtype=float))

    @staticmethod
    def _name(key: str, transport: Kind) -> str:
        return _MASS_NAME.get(key, key) if transport == "mass" else key

    def accepted(self, transport: Kind) -> tuple[str, ...]:
        """Names this record accepts in the given form (inputs, then parameters)."""
        return tuple(self._name(k, transport) for k in (*self.inputs, *self.parameters))

    def _collect(
        self, transport: Kind, given: Mapping[str, Any]
    ) -> tuple[dict[str, FloatOrArray], dict[str, tuple[float, float]]]:
        accepted = {self._name(k, transport): k for k in (*self.inputs, *self.parameters)}
        unknown = [k for k in given if k not in accepted]
        if unknown:
            hint = ""
            if transport == "mass" and "Pr" in unknown:
                hint = " (for mass transfer pass Sc, not Pr)"
            elif transport == "heat" and "Sc" in unknown:
                hint = " (for heat transfer pass Pr, not Sc)"
            renamed = [f"{u} is now {_RENAMED[u]}" for u in unknown if u in _RENAMED]
            if renamed:
                hint = f" ({'; '.join(renamed)}: d is the diameter, D only ever a diffusivity)"
            raise InputValueError(
                f"correlation {self.slug!r} does not use {', '.join(repr(u) for u in unknown)}{hint}; "
                f"it takes {', '.join(self.accepted(transport))}"
            )
        values: dict[str, FloatOrArray] = {}
        extremes: dict[str, tuple[float, float]] = {}
        for name, key in accepted.items():
            default = self.parameters.get(key)
            if name in given:
                v = as_float(name, given[name])
            elif default is not None:
                v = float(default)
            else:
                raise InputValueError(
                    f"correlation {self.slug!r} needs {name}; pass {name}=... "
                    f"(it takes {', '.join(self.accepted(transport))})"
                )
            # two reductions per array, no temporaries; NaN propagates into both
            if isinstance(v, float):
                vmin = vmax = v
            elif v.size:
                vmin, vmax = float(v.min()), float(v.max())
            else:
                values[key] = v
                continue
            if not (math.isfinite(vmin) and math.isfinite(vmax)):
                bad = vmin if not math.isfinite(vmin) else vmax
                raise InputValueError(f"{name}={bad!r} is not finite; pass finite values of {name}")
            if vmax > MAGNITUDE_LIMIT:
                raise InputValueError(
                    f"{name}={vmax!r} exceeds {MAGNITUDE_LIMIT:g}, the range accepted; pass a physical value"
                )
            lo, hi = self.domain.get(key, (0.0, math.inf))
            if key in _STRICTLY_POSITIVE and vmin <= 0.0:
                raise InputValueError(f"{name}={vmin!r} is not positive; pass {name} > 0")
            if vmin < lo or vmax > hi:
                bad = vmin if vmin < lo else vmax
                raise InputValueError(
                    f"{name}={bad!r} is outside {lo:g} to {hi:g}, where the equation of "
                    f"{self.slug!r} is defined; pass {name} in that range"
                )
            values[key] = v
            extremes[key] = (vmin, vmax)
        check_shapes(**values)
        return values, extremes

    def _check_envelope(
        self,
        transport: Kind,
        values: Mapping[str, FloatOrArray],
        extremes: Mapping[str, tuple[float, float]],
        strict: bool,
    ) -> list[str]:
        messages = []
        for key, (lo, hi) in self.envelope.items():
            if key not in extremes:
                continue
            vmin, vmax = extremes[key]
            if lo <= vmin and vmax <= hi:
                continue
            v = values[key]
            if isinstance(v, float):
                shown = repr(v)
            else:
                mask = (v < lo) | (v > hi)
                shown = f"{float(np.asarray(v)[mask].ravel()[0])!r} (and {int(mask.sum()) - 1} more)"
            msg = (
                f"correlation {self.slug!r}: {self._name(key, transport)}={shown} is outside its "
                f"envelope {lo:g} to {hi:g} ({self.reference})"
            )
            if strict:
                raise EnvelopeError(msg)
            messages.append(msg)
        for label, (names, (lo, hi)) in self.products.items():
            if not all(n in values for n in names):
                continue
            p = np.asarray(values[names[0]], dtype=float)
            for n in names[1:]:
                p = p * np.asarray(values[n], dtype=float)
            mask = (p < lo) | (p > hi)
            if not mask.any():
                continue
            formula = "*".join(self._name(n, transport) for n in names)
            shown = (
                repr(float(p))
                if p.ndim == 0
                else f"{float(p[mask].ravel()[0])!r} (and {int(mask.sum()) - 1} more)"
            )
            msg = (
                f"correlation {self.slug!r}: {label} = {formula} = {shown} is outside its "
                f"envelope {lo:g} to {hi:g} ({self.reference})"
            )
            if strict:
                raise EnvelopeError(msg)
            messages.append(msg)
        for switch, blo, bhi, env in self.branches:
            s = np.asarray(values[switch], dtype=float)
            on = (s >= blo) & (s < bhi)
            for key, (lo, hi) in env.items():
                v = np.asarray(values[key], dtype=float)
                mask = on & ((v < lo) | (v > hi))
                if not mask.any():
                    continue
                bad = np.broadcast_to(v, mask.shape)[mask].ravel()
                shown = (
                    repr(float(bad[0])) if mask.ndim == 0 else f"{float(bad[0])!r} (and {bad.size - 1} more)"
                )
                msg = (
                    f"correlation {self.slug!r}: {self._name(key, transport)}={shown} is outside the "
                    f"envelope {lo:g} to {hi:g} of its branch "
                    f"{blo:g} <= {self._name(switch, transport)} < {bhi:g} "
                    f"({self.reference})"
                )
                if strict:
                    raise EnvelopeError(msg)
                messages.append(msg)
        return messages

    def outside(self, transport: Kind, **inputs: Any) -> tuple[str, ...]:
        """Say where the given inputs leave the envelope, without evaluating or warning.

        Parameters
        ----------
        transport : {'heat', 'mass'}
            The form the inputs are named in.
        **inputs : float or array_like
            Inputs and parameters [-].

        Returns
        -------
        tuple of str
            One message per envelope condition left; empty inside.

        """
        values, extremes = self._collect(transport, inputs)
        return tuple(self._check_envelope(transport, values, extremes, strict=False))
