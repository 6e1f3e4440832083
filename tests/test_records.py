"""The Result record: validation names the field; JSON round trip keeps unknown fields."""

import json
import math

import pytest

from statsetter import (
    EffectSize,
    Estimate,
    GroupSummary,
    Interval,
    Note,
    Provenance,
    RecordError,
    Result,
    Statistic,
    Variable,
    dump_records,
    load_records,
)
from statsetter.errors import InputError


def full_record() -> Result:
    return Result(
        kind="t_independent",
        statistic=Statistic("t", 2.1436, (37.6,)),
        p=0.0386,
        n=40,
        estimate=Estimate("mean difference", 0.61, se=0.28, ci=Interval(0.95, 0.03, 1.18)),
        effects=(EffectSize("d", 0.68, Interval(0.95, 0.04, 1.31), method="noncentral t"),),
        groups=(GroupSummary("A", n=20, mean=4.1, sd=0.9), GroupSummary("B", n=20, mean=3.49, sd=0.88)),
        variables=(Variable("fatigue", "fatigue score", "outcome", "interval"),),
        notes=(Note("assumption", "Levene's test: F(1, 38) = 0.12, p = .73."),),
        provenance=Provenance("test", {"scipy": "1.17.1"}),
        details={"variant": "welch"},
        id="fatigue_by_shift",
    )


def test_round_trip():
    r = full_record()
    assert Result.from_json(r.to_json()) == r
    data = r.to_dict()
    assert data["schema"] == "statsetter.result" and data["version"] == 1


def test_unknown_fields_are_kept():
    data = full_record().to_dict()
    data["future_field"] = {"a": 1}
    data["effects"][0]["bias_corrected"] = True
    data["version"] = 2
    r = Result.from_dict(data)
    again = r.to_dict()
    assert again["future_field"] == {"a": 1}
    assert again["effects"][0]["bias_corrected"] is True


def test_frozen():
    r = full_record()
    with pytest.raises(AttributeError):
        r.p = 0.5  # type: ignore[misc]
    with pytest.raises(TypeError):
        r.details["variant"] = "student"  # type: ignore[index]


@pytest.mark.parametrize(
    "kwargs, field",
    [
        ({"p": 1.2}, "p"),
        ({"p": -0.01}, "p"),
        ({"p": math.nan}, "p"),
        ({"n": -3}, "n"),
        ({"n": 2.5}, "n"),
        ({"statistic": Statistic("t", 1.0, (0,))}, "statistic.df[0]"),
        ({"statistic": Statistic("t", 1.0, (-2,))}, "statistic.df[0]"),
        ({"statistic": Statistic("t", math.nan, (2,))}, "statistic.value"),
        ({"statistic": Statistic("F", 1.0, (1, 2, 3))}, "statistic.df"),
        ({"effects": (EffectSize("d", 0.5, Interval(0.95, 0.9, 0.1)),)}, "effects[0].ci"),
        ({"effects": (EffectSize("d", 0.5, Interval(95, 0.1, 0.9)),)}, "effects[0].ci.level"),
        ({"effects": (EffectSize("d", math.inf),)}, "effects[0].value"),
        ({"groups": (GroupSummary("A", sd=-1.0),)}, "groups[0].sd"),
        ({"groups": (GroupSummary("A", n=-1),)}, "groups[0].n"),
        ({"groups": (GroupSummary("A", percent=120.0),)}, "groups[0].percent"),
        ({"estimate": Estimate("OR", -1.0, ratio=True)}, "estimate.value"),
        ({"alternative": "both"}, "alternative"),
        ({"kind": ""}, "kind"),
        ({"details": {"x": [1, 2]}}, "details.x"),
        ({"alpha": 1.5}, "alpha"),
        ({"notes": (Note("opinion", "x"),)}, "notes[0].kind"),  # type: ignore[arg-type]
    ],
)
def test_validation_names_the_field(kwargs, field):
    base = {"kind": "t_independent"}
    base.update(kwargs)
    with pytest.raises(RecordError) as info:
        Result(**base)
    assert info.value.field == field
    assert str(info.value).startswith(field)


def test_load_records_errors_name_the_record():
    good = full_record().to_dict()
    bad = dict(good, p=2)
    with pytest.raises(InputError, match=r"authors\.json: record 2: p: 2 is outside"):
        load_records(json.dumps([good, bad]), source="authors.json")
    with pytest.raises(InputError, match="not valid JSON"):
        load_records("[{", source="x.json")
    with pytest.raises(InputError, match="schema"):
        load_records(json.dumps([dict(good, schema="other")]))


def test_dump_and_load_many():
    rs = [full_record(), Result(kind="pearson", statistic=Statistic("r", 0.3, (98,)), p=0.002, n=100)]
    assert load_records(dump_records(rs)) == rs


def test_a_part_validated_before_is_still_refused_in_the_wrong_place():
    """Parts validated once are not validated again when a record is copied with replace() (half the parts a run
    validates had been), but where each part stands is checked every time: a note once valid in ``notes`` is refused
    in ``groups`` (before, a recently seen note had skipped that check)."""
    from dataclasses import replace

    note = Note("method", "Welch's t test.")
    record = Result("t_independent", notes=(note,), groups=(GroupSummary("a", n=3),))
    assert replace(record, id="x").notes[0] is note
    with pytest.raises(RecordError) as info:
        Result("t_independent", groups=(note,))  # type: ignore[arg-type]
    assert info.value.field == "groups[0]"
    with pytest.raises(RecordError) as info:
        replace(record, groups=(GroupSummary("b", n=-1),))  # a new part is validated
    assert info.value.field == "groups[0].n"


def test_records_json_is_the_json_modules_indented_text():
    """dump_records writes indented JSON in one pass (the json module's indented writer is pure Python and took twice
    the time): its text must be json.dumps(..., ensure_ascii=False, indent=n)'s byte for byte — on 3,000 random
    structures (text with quotes, backslashes, control characters and non-ASCII letters; floats with NaN, ±inf, −0.0
    and extremes; whole numbers beyond 64 bits; booleans, null, empty and nested containers, tuples) and for every
    indent; a structure with a key that is not text, or a number type of numpy's, goes to json.dumps itself."""
    import random

    import numpy as np

    from statsetter.records import exchange

    rng = random.Random(7)
    texts = ["", "p < .05", 'he said "t"', "back\\slash", "tab\there", "line\nbreak", "\x00\x1f", "χ² η²p — ±",
             "\u2028\u2029", "😀", "ünïcödé"]
    floats = [0.0, -0.0, 1.0, 2.5e-300, 1e16, 1.7976931348623157e308, math.nan, math.inf, -math.inf, 0.1 + 0.2, -3.25]

    def make(depth: int) -> object:
        pick = rng.random()
        if depth > 3 or pick < 0.45:
            return rng.choice([rng.choice(texts), rng.choice(floats), rng.randint(-10**20, 10**20), True, False, None])
        if pick < 0.7:
            return [make(depth + 1) for _ in range(rng.randint(0, 4))]
        if pick < 0.75:
            return tuple(make(depth + 1) for _ in range(rng.randint(0, 3)))
        return {rng.choice(texts) + str(i): make(depth + 1) for i in range(rng.randint(0, 4))}

    for _ in range(3000):
        data = make(0)
        for indent in (0, 1, 2, 4):
            assert exchange._indented(data, " " * indent) == json.dumps(data, ensure_ascii=False, indent=indent)
    for odd in ({1: "a"}, [np.float64(0.5)], {"k": [None, {2.5: 1}]}):
        with pytest.raises(exchange._NotPlain):
            exchange._indented(odd, "  ")
    records = [Result("t_independent", statistic=Statistic("t", 2.5, (38.0,)), p=0.017, extra={"odd": {3: "x"}})]
    assert dump_records(records) == json.dumps([r.to_dict() for r in records], ensure_ascii=False, indent=2)
