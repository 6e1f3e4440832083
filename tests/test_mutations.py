"""Inputs damaged at random, as a campaign of the twenty-third session did over every command (12,000 runs, which
found the internal errors and silent wrong results tests/test_hostile_inputs.py now holds one by one): a small,
seeded share of it runs here, so that a new kind of failure of the same shapes shows.

Each case asserts the README's exit contract (0 to 3, never 4: an internal error), no traceback, and every input
byte-identical afterwards. The data are the Palmer penguins as pingouin bundles them (Gorman, Williams & Fraser, 2014);
the damage is made here.
"""

from __future__ import annotations

import hashlib
import json
import random
import zipfile
from pathlib import Path

import pingouin as pg
import pytest

from statsetter.cli import main

_COLUMNS = ["species", "island", "bill_length_mm", "bill_depth_mm", "flipper_length_mm", "body_mass_g", "sex"]  # (pingouin's columns)
_PLAN = {
    "analyses": [
        {"id": "mass_sex", "kind": "t_independent", "outcome": "body_mass_g", "group": "sex"},
        {"id": "flipper_species", "kind": "anova_oneway", "outcome": "flipper_length_mm", "group": "species", "variant": "welch"},
        {"id": "pairs", "kind": "posthoc", "outcome": "flipper_length_mm", "group": "species"},
        {"id": "island_species", "kind": "chi_square", "row": "island", "column": "species"},
        {"id": "bill", "kind": "pearson", "x": "bill_length_mm", "y": "bill_depth_mm"},
        {"id": "mass_model", "kind": "linear_regression", "outcome": "body_mass_g", "predictors": ["flipper_length_mm", "sex"]},
        {"id": "two_way", "kind": "factorial_anova", "outcome": "body_mass_g", "factors": ["species", "sex"]},
        {"id": "ranks", "kind": "kruskal_wallis", "outcome": "bill_depth_mm", "group": "island"},
    ],
    "tables": [{"kind": "descriptives", "group": "species", "compare": True}, {"kind": "results", "analyses": ["mass_sex", "bill"]}],
}
_WILD = ["nope", "", 0, -1, 2.5, [], ["sex"], ["sex", "species"], True, {"a": 1}, "species", "body_mass_g", 1e308]
_CELLS = ["", "NA", "-99", "1e400", "inf", "abc", " 3 ", "3,5", "0", "3750g", "5.1"]


def _toml(value: object) -> str:
    if isinstance(value, dict):
        return "{ " + ", ".join(f"{json.dumps(k)} = {_toml(v)}" for k, v in value.items()) + " }"
    if isinstance(value, list):
        return "[" + ", ".join(_toml(v) for v in value) + "]"
    return json.dumps(value) if not isinstance(value, bool) else str(value).lower()


def _plan_text(plan: dict) -> str:
    lines = ['[data]', 'path = "d.csv"']
    for section in ("analyses", "tables"):
        for entry in plan[section]:
            lines.append(f"[[{section}]]")
            lines += [f"{json.dumps(k)} = {_toml(v)}" for k, v in entry.items()]
    return "\n".join(lines + ["[outputs]", 'folder = "out"', 'md = "r.md"', 'docx = "r.docx"', 'tex = "r.tex"', 'json = "r.json"']) + "\n"


_CODES: list[int] = []  # every exit status seen, for the last test's check that the damage left some runs whole


def _snapshot(folder: Path) -> dict[str, str]:
    return {str(p.relative_to(folder)): hashlib.sha256(p.read_bytes()).hexdigest() for p in folder.rglob("*") if p.is_file()}


def _contract(args: list[str], folder: Path, capsys) -> int:
    before = _snapshot(folder)
    code = main(args)
    out, err = capsys.readouterr()
    _CODES.append(code)
    assert code in (0, 1, 2, 3), err
    assert "Traceback" not in out + err and "internal error" not in err, err
    after = _snapshot(folder)
    assert {k: after.get(k) for k in before} == before  # every input as it was (outputs may be new)
    return code


@pytest.mark.parametrize("seed", range(24))
def test_a_plan_and_its_data_damaged_at_random(tmp_path, monkeypatch, capsys, seed):
    """Keys removed or given values of the wrong kind, columns named that are not there, data cells replaced by codes,
    text or numbers beyond a double, a column made constant or emptied, the data cut to a few rows."""
    rng = random.Random(seed)
    monkeypatch.chdir(tmp_path)
    plan = json.loads(json.dumps(_PLAN))
    plan["analyses"] = rng.sample(plan["analyses"], rng.randint(1, 4))
    ids = {a["id"] for a in plan["analyses"]}
    plan["tables"] = [t for t in plan["tables"] if all(r in ids for r in t.get("analyses", []))]
    for _ in range(rng.choice([0, 0, 0, 1, 2])):
        entry = rng.choice(plan["analyses"] + plan["tables"])
        key = rng.choice([k for k in entry if k not in ("id", "kind")] or ["extra"])
        if rng.random() < 0.3:
            entry.pop(key, None)
        else:
            entry[key] = rng.choice(_COLUMNS) if rng.random() < 0.6 else rng.choice(_WILD)
    data = pg.read_dataset("penguins").astype(object)
    damage = rng.choice(["cells", "rows", "constant", "empty", "none", "none", "none", "none"])
    column = rng.choice(_COLUMNS)
    if damage == "cells":
        for _ in range(rng.randint(1, 40)):
            data.iat[rng.randrange(len(data)), rng.randrange(data.shape[1])] = rng.choice(_CELLS)
    elif damage == "rows":
        data = data.head(rng.randint(1, 6))
    elif damage == "constant":
        data[column] = 5.1
    elif damage == "empty":
        data[column] = None
    data.to_csv(tmp_path / "d.csv", index=False)
    (tmp_path / "plan.toml").write_text(_plan_text(plan), encoding="utf-8")
    _contract(["run", "plan.toml"], tmp_path, capsys)


def _manuscript(path: Path, rng: random.Random) -> None:
    import docx

    pieces = ["t(38) = 2.14, p = .039", "F(2, 97) = 4.51, p = .013, η²p = .09", "χ²(1, N = 80) = 3.90, p = .048", "r(48) = −.31, p = .03",
              "OR = 1.70, 95% CI [1.10, 2.60]", "M = 3.2, SD = 1.1", "p < .001", "z = 1.96", "U = 45, p = .20"]
    document = docx.Document()
    for _ in range(rng.randint(2, 12)):
        paragraph = document.add_paragraph()
        for piece in rng.sample(pieces, rng.randint(1, 4)):
            paragraph.add_run(piece + "; ").italic = rng.random() < 0.3
    document.save(str(path))


@pytest.mark.parametrize("seed", range(24))
def test_a_word_manuscript_damaged_at_random(tmp_path, monkeypatch, capsys, seed):
    """Bytes of the archive overwritten, or the document's XML cut or given stray markup inside a sound archive (and a
    third left sound); audited, annotated and revised: refused by name or read, never an internal error, the manuscript
    untouched."""
    rng = random.Random(seed)
    monkeypatch.chdir(tmp_path)
    _manuscript(tmp_path / "m.docx", rng)
    if seed % 3 == 0:
        pass  # (sound: read, annotated and revised in full)
    elif seed % 3 == 1:
        data = bytearray((tmp_path / "m.docx").read_bytes())
        for _ in range(rng.randint(1, 20)):
            data[rng.randrange(len(data))] = rng.randrange(256)
        (tmp_path / "m.docx").write_bytes(bytes(data))
    else:
        with zipfile.ZipFile(tmp_path / "m.docx") as z:
            parts = {n: z.read(n) for n in z.namelist()}
        xml = parts["word/document.xml"]
        at = rng.randrange(len(xml))
        parts["word/document.xml"] = xml[:at] + rng.choice([b"<", b"&", b"", b"<w:p>", b"\xff", b"]]>"]) + xml[at + rng.randint(0, 40):]
        with zipfile.ZipFile(tmp_path / "m.docx", "w") as z:
            for name, blob in parts.items():
                z.writestr(name, blob)
    for extra in ([], ["--json"], ["--annotate", "a.docx"], ["--revise", "v.docx"]):
        code = _contract(["audit", "m.docx", *extra], tmp_path, capsys)
        if code == 2:  # refused: the file cannot be read, whatever is asked of it
            break


def test_the_damage_leaves_some_runs_whole():
    """Not every case is refused at its first line: some plans run and some manuscripts are read in full (else the cases
    above would test the refusals only). Runs after the cases above (pytest keeps a file's order)."""
    if len(_CODES) < 40:
        pytest.skip("run with the cases above")
    assert _CODES.count(2) < len(_CODES) * 0.8 and any(code in (0, 1) for code in _CODES)


def test_the_python_api_given_arguments_of_every_wrong_kind():
    """300 seeded calls of the public analyses, each with one argument replaced by a value of another kind (numbers,
    NaN, text, lists, mappings, a column or the whole table where a name is asked, booleans, None): each either runs or
    raises statsetter's own error naming the function and argument — or Python's TypeError for an argument the
    function has not got — never an AttributeError, KeyError or ValueError from pandas, numpy or scipy (a campaign of
    over 15,000 such calls found 18 kinds of those). The penguins and pingouin's mixed_anova data as pingouin bundles them."""
    import inspect
    import warnings

    import numpy as np

    import statsetter
    from statsetter import analyses

    penguins = pg.read_dataset("penguins")
    mixed = pg.read_dataset("mixed_anova")
    long = dict(outcome="Scores", subject="Subject", within="Time")
    calls = {  # a call that runs, for each function
        "t_independent": ((penguins, "body_mass_g", "sex"), {}), "t_one_sample": ((penguins, "body_mass_g"), {}),
        "mann_whitney": ((penguins, "body_mass_g", "sex"), {}), "spearman": ((penguins, "bill_length_mm", "body_mass_g"), {}),
        "anova_oneway": ((penguins, "body_mass_g", "species"), {}), "chi_square": ((penguins, "sex", "species"), {}),
        "describe": ((penguins, ["body_mass_g", "species"]), {}), "correlation_matrix": ((penguins, ["bill_length_mm", "body_mass_g"]), {}),
        "linear_regression": ((penguins, "body_mass_g", ["bill_length_mm", "sex"]), {}), "posthoc": ((penguins, "body_mass_g", "species"), {}),
        "cronbach_alpha": ((penguins, ["bill_length_mm", "bill_depth_mm", "flipper_length_mm"]), {}),
        "factorial_anova": ((penguins, "body_mass_g", ("species", "sex")), {}), "ancova": ((penguins, "body_mass_g", "species", ["bill_length_mm"]), {}),
        "t_paired": ((mixed,), dict(long, conditions=["August", "January"])), "rm_anova": ((mixed,), long),
        "mixed_anova": ((mixed, "Scores", "Subject", "Time", "Group"), {}), "logistic_regression": ((penguins, "sex", ["body_mass_g"]), {}),
        "mixed_model": ((mixed, "Scores", ["Time"], "Subject"), {}), "mediation": ((penguins, "bill_length_mm", "flipper_length_mm", "body_mass_g"), dict(n_boot=1000)),
        "goodness_of_fit": ((penguins, "species", {"Adelie": 0.4, "Gentoo": 0.3, "Chinstrap": 0.3}), {}),
    }
    wild = [5, 1.5, 0, True, None, "x", "", "body_mass_g", ["x"], [], {}, {"a": 1}, (1, 2), float("nan"), float("inf"), np.int64(3),
            penguins, penguins["body_mass_g"], b"bytes", object(), ["body_mass_g", 5], [None], 10**20, -0.5]
    rng = random.Random(23)
    seen = {"ran": 0, "refused": 0, "no such argument": 0}
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        for _ in range(300):
            name = rng.choice(sorted(calls))
            fn = getattr(analyses, name)
            args, kwargs = list(calls[name][0]), dict(calls[name][1])
            params = list(inspect.signature(fn).parameters.values())
            target, value = rng.choice(params), rng.choice(wild)
            if params.index(target) < len(args):
                args[params.index(target)] = value
            else:
                kwargs[target.name] = value
            try:
                fn(*args, **kwargs)
                seen["ran"] += 1
            except statsetter.StatsetterError as error:
                assert str(error), (name, target.name)
                seen["refused"] += 1
            except TypeError as error:
                assert "argument" in str(error), (name, target.name, value, error)
                seen["no such argument"] += 1
    assert seen["refused"] > 200, seen


def test_generated_clusters_of_descriptives_keep_their_numbers_and_words_when_restyled():
    """400 seeded clusters of descriptives, p's and effect sizes typed loosely ("n=37; M =3.71; SD=58.6", words and
    brackets between), audited with restyling in APA 7 and AMA 11: none fails; no statistic without a test holds one
    name twice (each group's mean is its own); every restyled text keeps the words and numbers as typed (to the
    style's rounding; thousands grouped; a p as the style prints it). A campaign of 6,000 found no case otherwise."""
    import re

    from statsetter.audit.reading import Unit
    from statsetter.audit.report import audit_units

    rng = random.Random(24)
    words = ["years", "points", "and", "vs.", "in the control group", "(", ")", ";", ",", "respectively"]

    def piece() -> str:
        name = rng.choice(["M", "SD", "n", "N", "Mdn", "M", "SD", "p", "d"])
        if name == "p":
            return rng.choice(["p = .03", "p<.001", "p = 0.042", "ns", "p > .05"])
        value = str(rng.randint(2, 400)) if name in "nN" else f"{rng.uniform(0, 60):.{rng.randint(0, 3)}f}"
        return f"{name}{rng.choice([' = ', '=', ' =', '= '])}{value}"

    def numbers(text: str) -> list[float]:
        plain = re.sub(r"[pP]\s*[=<>]\s*\d*\.?\d+", " ", text.replace(",", ""))
        return [float(x) for x in re.findall(r"\d+(?:\.\d+)?|\.\d+", plain)]

    for _ in range(400):
        text = "Scores " + " ".join(piece() if rng.random() < 0.6 else rng.choice(words) for _ in range(rng.randint(1, 10))) + "."
        for entry in audit_units([Unit("p", text, [(0, 0)])], rng.choice(["apa7", "ama11"]), restyle=True, grim_items=rng.choice([None, 1])):
            if not re.search(r"(?<![A-Za-z])[tFrzχUHW]\s*[(=<>]", entry.found):
                names = re.findall(r"(?<![A-Za-z])(M|SD|Mdn)\s*=", entry.found)
                assert len(names) == len(set(names)), (text, entry.found)
            if entry.revision is not None:
                new = entry.revision.plain().replace("\u00a0", " ")
                before, after = numbers(entry.found), numbers(new)  # (the style rounds to two decimals at most: 0.005)
                assert len(before) == len(after) and all(abs(a - b) <= 0.0051 for a, b in zip(before, after)), (entry.found, new)
                assert re.findall(r"[a-z]{2,}", new) == re.findall(r"[a-z]{2,}", entry.found), (entry.found, new)
