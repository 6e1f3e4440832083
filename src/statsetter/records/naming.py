"""Meaningful record ids: an analysis' records are named from its id and
what each record is about, so that an id survives a change of data or of
order (``model:age``, ``model:cp.atypical_angina``, ``traits:openness~age``,
``fa:supp:dose``, ``tab:fisher``). The first record, the analysis' main
result, takes the analysis id itself."""

from __future__ import annotations

import re
from dataclasses import replace
from typing import Sequence

from .exchange import Record
from .result import Result

__all__ = ["name_records", "record_key", "ID_PATTERN"]

ID_PATTERN = r"[A-Za-z0-9_.\-:~]+"  # what a marker can name
_UNSAFE = re.compile(r"[^A-Za-z0-9_.\-]+")


def _slug(text: str) -> str:
    return _UNSAFE.sub("_", str(text)).strip("_") or "_"


def record_key(record: Result) -> str:
    """What a record is about, as an id part: a coefficient's predictor (and
    category), a term's factors, a pair's two names, a step's number."""
    kind, details = record.kind, record.details
    model = f"model{details['step']}" if "step" in details and kind != "linear_step" else ""  # a step's model, intercept and coefficients
    if kind.endswith("_coefficient"):
        predictor = record.variable("predictor")
        if predictor is None or str(details.get("term", "")).lower() in ("intercept", "const"):
            return f"{model}.intercept" if model else "intercept"
        category = details.get("category")
        key = _slug(predictor.name) + (f".{_slug(category)}" if category is not None else "")
        return f"{model}.{key}" if model else key
    if model:
        return model
    if kind == "anova_term":
        factors = [v for v in record.variables if v.role == "factor"]
        if details.get("interaction"):
            return ":".join(_slug(v.name) for v in factors)
        term = details.get("term")
        named = [v.name for v in factors if term in (v.label, v.name)]
        return _slug(named[0] if named else term or kind)
    if kind == "posthoc_pair" and len(record.groups) == 2:
        return "~".join(_slug(g.label) for g in record.groups)
    if kind in ("pearson", "spearman", "kendall"):
        x, y = record.variable("x"), record.variable("y")
        if x is not None and y is not None:
            return f"{_slug(x.name)}~{_slug(y.name)}"
    if kind == "linear_step":
        return f"step{details.get('step', '')}"
    if kind == "fisher_exact":
        return "fisher"
    return _slug(kind)


_PARTS_ONLY = ("posthoc_pair", "anova_term")  # analyses whose records are all parts: no one of them is the whole


def name_records(base: str, records: Sequence[Record]) -> list[Record]:
    """``records`` with ids from ``base``: the first (the main result) is
    ``base``, each other ``base:key``; the pairs of a post hoc analysis and
    the terms of a factorial ANOVA are all ``base:key``, none being the whole.
    A key met twice gets ``-2``, ``-3`` ... in order."""
    out: list[Record] = []
    seen: set[str] = set()
    for k, r in enumerate(records):
        whole = k == 0 and not (isinstance(r, Result) and r.kind in _PARTS_ONLY)
        rid = base if whole or not isinstance(r, Result) else f"{base}:{record_key(r)}"
        if rid in seen:
            n = 2
            while f"{rid}-{n}" in seen:
                n += 1
            rid = f"{rid}-{n}"
        seen.add(rid)
        out.append(replace(r, id=rid))
    return out
