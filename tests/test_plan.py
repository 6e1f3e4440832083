"""The plan file: validation with lines and close matches, running, outputs.

Data: the Palmer penguins as pingouin bundles them (Gorman, Williams &
Fraser, 2014); the plan's record must be the one the analysis gives directly,
whose numbers tests/test_analyses_basic.py checks against scipy.
"""

from __future__ import annotations

import json

import docx
import pingouin as pg
import pytest

from statsetter.analyses import t_independent
from statsetter.cli import main
from statsetter.plan import PlanError, load_plan, run_plan


@pytest.fixture
def folder(tmp_path):
    pg.read_dataset("penguins").to_csv(tmp_path / "penguins.csv", index=False)
    return tmp_path


def write(folder, text):
    path = folder / "plan.toml"
    path.write_text(text, encoding="utf-8")
    return path


GOOD = """title = "Penguins"
[data]
path = "penguins.csv"
labels = { body_mass_g = "body mass" }

[[analyses]]
id = "mass_by_sex"
kind = "t_independent"
outcome = "body_mass_g"
group = "sex"

[[tables]]
kind = "descriptives"
variables = ["body_mass_g", "species"]
group = "sex"

[outputs]
folder = "out"
md = "results.md"
docx = "results.docx"
json = "records.json"
"""


def test_plan_runs_and_matches_the_analysis(folder, capsys):
    path = write(folder, GOOD)
    result = run_plan(load_plan(path))
    direct = t_independent(pg.read_dataset("penguins"), "body_mass_g", "sex", labels={"body_mass_g": "body mass"}).main
    assert result.records[0].id == "mass_by_sex"
    assert result.records[0].statistic == direct.statistic and result.records[0].p == direct.p
    assert result.tables[0].number == 1
    assert main(["run", str(path)]) == 0
    out = capsys.readouterr().out
    assert "results.md" in out and (folder / "out" / "results.docx").exists()
    md = (folder / "out" / "results.md").read_text(encoding="utf-8").replace("\u00a0", " ")
    assert "Welch's *t*(323.90) = −8.55" in md and "**Table 1**" in md and "Table 1 describes the sample by sex." in md
    # the caution and the tool's notes go to run-notes.md, not into the manuscript (unless caution = true)
    assert "qualified statistician" not in md and "qualified statistician" in (folder / "out" / "run-notes.md").read_text(encoding="utf-8")
    assert main(["run", str(path), "--format", "json"]) == 0
    assert json.loads(capsys.readouterr().out)[0]["id"] == "mass_by_sex"


@pytest.mark.parametrize(
    "change,message",
    [
        (("outcome = \"body_mass_g\"", "outcme = \"body_mass_g\""), "line 9 (analyses[0].outcme): unknown key 'outcme'; did you mean outcome?"),
        (("kind = \"t_independent\"", "kind = \"t_indep\""), "line 8 (analyses[0].kind): unknown kind 't_indep'; did you mean t_independent?"),
        (("outcome = \"body_mass_g\"", "outcome = \"body_mass\""), "line 9 (analysis 'mass_by_sex'): body_mass: no such column; did you mean body_mass_g?"),
        (("labels = { body_mass_g", "labels = { body_mas"), "line 4 (data.labels): body_mas: no such column; did you mean body_mass_g"),
        (("title = \"Penguins\"", "titel = \"Penguins\""), "line 1 (titel): unknown key 'titel'; did you mean title?"),
        (("species\"]\ngroup = \"sex\"", "species\"]\ngroup = \"sx\""), "(table 1): sx: no such column; did you mean sex"),
        (("path = \"penguins.csv\"", "path = \"pinguins.csv\""), "line 3: "),
        (("md = \"results.md\"", "mdd = \"results.md\""), "line 19 (outputs.mdd): unknown key 'mdd'; did you mean md"),
    ],
)
def test_bad_plans_name_the_line(folder, capsys, change, message):
    path = write(folder, GOOD.replace(*change))
    assert main(["run", str(path)]) == 2
    err = capsys.readouterr().err
    assert message in err and "Traceback" not in err and len(err.strip().splitlines()) <= 2
    assert not (folder / "out").exists()


def test_bad_scale_item_names_its_line(folder, capsys):
    path = write(folder, GOOD.replace("[[analyses]]", "[[scales]]\nname = \"size\"\nitems = [\"bill_length_mm\", \"bill_depht_mm\"]\n\n[[analyses]]", 1))
    assert main(["run", str(path)]) == 2
    assert "line 8 (scale 'size'): bill_depht_mm: no such column; did you mean bill_depth_mm" in capsys.readouterr().err


def test_not_toml_and_no_data(folder):
    with pytest.raises(PlanError, match="not valid TOML"):
        load_plan(write(folder, "title = \n"))
    with pytest.raises(PlanError, match=r"needs a \[data\] table"):
        load_plan(write(folder, "title = 'x'\n"))
    with pytest.raises(PlanError, match="used twice"):
        load_plan(write(folder, GOOD + "\n[[analyses]]\nid = \"mass_by_sex\"\nkind = \"auto\"\noutcome = \"a\"\npredictor = \"b\"\n"))


def test_a_descriptives_table_without_variables_leaves_out_an_id_column(folder, capsys):
    # every column by default, but not one that looks like an identifier; the run says so
    # (common practice: Table 1 describes variables, not case IDs)
    frame = pg.read_dataset("penguins")[["species", "island", "sex"]]
    frame.insert(0, "bird", [f"P{i:03d}" for i in range(len(frame))])
    frame.to_csv(folder / "birds.csv", index=False)
    path = write(folder, '[data]\npath = "birds.csv"\n\n[[tables]]\nkind = "descriptives"\ngroup = "sex"\n\n[outputs]\nfolder = "out"\nmd = "t.md"\n')
    result = run_plan(load_plan(path))
    assert any(n.startswith("tables[0]: left out bird: nominal") for n in result.notes)
    assert main(["run", str(path)]) == 0
    assert "left out bird" in capsys.readouterr().out
    assert "P001" not in (folder / "out" / "t.md").read_text(encoding="utf-8")


def test_a_regression_table_needs_a_regression(folder, capsys):
    # the plan names the table when its analysis is not a regression
    text = GOOD.replace('[[tables]]\nkind = "descriptives"\nvariables = ["body_mass_g", "species"]\ngroup = "sex"\n',
                        '[[tables]]\nkind = "regression"\nanalysis = "mass_by_sex"\n')
    assert 'kind = "regression"' in text
    with pytest.raises(PlanError, match=r"\(table 1\): regression table: give the records of linear or of logistic regressions"):
        run_plan(load_plan(write(folder, text)))


def test_an_automatic_test_choice_is_shown_in_the_run_and_the_section(folder, capsys):
    # automatic choices are shown, never silent (the project's cautions): the run summary and
    # every results section name the test chosen and why
    text = GOOD.replace('kind = "t_independent"\noutcome = "body_mass_g"\ngroup = "sex"', 'kind = "auto"\noutcome = "body_mass_g"\npredictor = "species"')
    assert 'kind = "auto"' in text
    path = write(folder, text)
    assert main(["run", str(path)]) == 0
    assert "mass_by_sex: Chosen automatically: one-way ANOVA" in capsys.readouterr().out
    # a tool's note stays out of the manuscript (issue: a results section, not a dump): it goes to run-notes.md
    md = (folder / "out" / "results.md").read_text(encoding="utf-8")
    notes = (folder / "out" / "run-notes.md").read_text(encoding="utf-8")
    assert "Chosen automatically" not in md and "- mass_by_sex: Chosen automatically: one-way ANOVA" in notes
    word = "\n".join(p.text for p in docx.Document(str(folder / "out" / "results.docx")).paragraphs)
    assert "Chosen automatically" not in word and "One-way analysis of variance" in word or "one-way analysis of variance" in word


FIGURE = "\n[[figures]]\nkind = \"means\"\nanalysis = \"mass_by_sex\"\n"


def test_a_plan_figure_is_written_beside_the_documents(folder, capsys):
    path = write(folder, GOOD.replace("[outputs]", FIGURE + "\n[[figures]]\nkind = \"categories\"\ntable = \"table_1\"\nvariable = \"species\"\n\n[outputs]"))
    assert main(["run", str(path)]) == 0
    out = folder / "out"
    assert {p.name for p in out.glob("figure_*")} == {f"figure_{i}.{x}" for i in (1, 2) for x in ("png", "svg", "pdf")}
    md = (out / "results.md").read_text(encoding="utf-8")
    assert "**Figure 1**" in md and "](figure_2.png)" in md and "Figure 1 shows the percentage in each category of species by sex." in md
    assert md.index("**Table 1**") < md.index("**Figure 1**") < md.index("Welch's")  # the Table 1 figure follows Table 1


@pytest.mark.parametrize(
    "figure,message",
    [
        ("\n[[figures]]\nkind = \"pie\"\nanalysis = \"mass_by_sex\"\n", "(figures[0].kind): 'pie' is not one of means, interaction, scatter, forest, categories"),
        ("\n[[figures]]\nkind = \"means\"\nanalysis = \"mass\"\n", "(figures[0].analysis): no analysis with id 'mass'"),
        ("\n[[figures]]\nkind = \"means\"\nanalysis = \"mass_by_sex\"\ncolour = \"red\"\n", "(figures[0].colour): unknown key 'colour'"),
        ("\n[[figures]]\nkind = \"categories\"\ntable = \"table_9\"\nvariable = \"species\"\n", "(figures[0].table): no descriptives table with id 'table_9'"),
        ("\n[[figures]]\nkind = \"interaction\"\nanalysis = \"mass_by_sex\"\n", "(figure 'figure_1'): figure (interaction): no interaction record with cell means"),
        ("\n[[figures]]\nid = \"table_1\"\nkind = \"means\"\nanalysis = \"mass_by_sex\"\n", "(figures[0].id): 'table_1': a figure id is used once, not by a table"),
        ("\n[[figures]]\nkind = \"categories\"\ntable = \"table_1\"\nvariable = \"body_mass_g\"\n", "no categorical variable of that name"),
    ],
)
def test_bad_figures_name_the_line_and_write_nothing(folder, capsys, figure, message):
    path = write(folder, GOOD.replace("[outputs]", figure + "\n[outputs]"))
    assert main(["run", str(path)]) == 2
    err = capsys.readouterr().err
    assert message in err and "Traceback" not in err
    assert not (folder / "out").exists()


def test_run_leaves_the_collector_as_it_found_it(folder, capsys, monkeypatch):
    # the command freezes what exists before the data and each analysis (the collector's full passes then skip the
    # libraries' modules) and unfreezes afterwards: a program or test that calls main() keeps a collector that frees
    # its cycles
    import gc

    from statsetter.cli import run as command

    path = write(folder, GOOD.replace("[[tables]]", "[[analyses]]\nid = \"mass_by_species\"\nkind = \"anova_oneway\"\n"
                                      "outcome = \"body_mass_g\"\ngroup = \"species\"\n\n[[tables]]"))
    frozen = []
    settled = command._settled
    monkeypatch.setattr(command, "_settled", lambda name="": (settled(name), frozen.append(gc.get_freeze_count())))
    assert main(["run", str(path), "--format", "json"]) == 0
    assert len(frozen) == 3 and all(n > 0 for n in frozen)  # frozen before the data are read and before each of the two analyses
    assert gc.get_freeze_count() == 0  # and nothing left frozen
    with_settling = capsys.readouterr().out
    assert json.loads(with_settling) == [r.to_dict() for r in run_plan(load_plan(path)).records]  # the same records


def test_the_process_entry_freezes_on_its_way_out(monkeypatch, capsys):
    # statsetter's process (console script, python -m) freezes its objects as it ends: the interpreter's exit then
    # neither walks nor frees them one by one; main() itself, called from a program, does not
    import gc

    from statsetter.cli import entry

    monkeypatch.setattr("sys.argv", ["statsetter", "--version"])
    assert gc.get_freeze_count() == 0
    main(["--version"])
    assert gc.get_freeze_count() == 0
    try:
        assert entry() == 0
        assert gc.get_freeze_count() > 0
    finally:
        gc.unfreeze()
    assert "statsetter" in capsys.readouterr().out


def test_the_process_writes_every_output_whole_before_it_exits(folder, capsys):
    # the process freezes its objects as it ends (cli.entry): every file a run writes is complete on disk — the same
    # Markdown as a run in this process, a Word document python-docx opens, records that load
    import subprocess
    import sys

    path = write(folder, GOOD)
    proc = subprocess.run([sys.executable, "-m", "statsetter", "run", str(path)], capture_output=True, text=True, cwd=folder)
    assert proc.returncode == 0, proc.stderr
    out = folder / "out"
    md = (out / "results.md").read_text(encoding="utf-8")
    records = json.loads((out / "records.json").read_text(encoding="utf-8"))
    paragraphs = [p.text for p in docx.Document(str(out / "results.docx")).paragraphs]
    out.rename(folder / "subprocess-out")
    assert main(["run", str(path)]) == 0
    assert md == (out / "results.md").read_text(encoding="utf-8")
    assert records == json.loads((out / "records.json").read_text(encoding="utf-8"))
    assert paragraphs == [p.text for p in docx.Document(str(out / "results.docx")).paragraphs] and any("8.55" in p for p in paragraphs)


def test_a_table_set_on_landscape_pages_is_said_in_the_run_notes(tmp_path, capsys):
    # "automatic choices are shown": a Table 1 of pingouin's penguins by species × island (five groups, Total, p) is
    # too wide for a portrait page; the Word and LaTeX writers turn it, the terminal says so, and so do the run's notes
    data = pg.read_dataset("penguins")
    data["group"] = data.species + " " + data.island
    data.to_csv(tmp_path / "penguins.csv", index=False)
    path = write(tmp_path, '[data]\npath = "penguins.csv"\nlabels = { bill_length_mm = "Bill length measured from the tip (mm)" }\n\n'
                 '[[tables]]\nkind = "descriptives"\nvariables = ["bill_length_mm", "flipper_length_mm", "sex"]\ngroup = "group"\n'
                 'compare = true\n\n[outputs]\nfolder = "out"\ndocx = "results.docx"\ntex = "results.tex"\nnotes = "notes.md"\n')
    assert main(["run", str(path)]) == 0
    err = capsys.readouterr().err
    assert "Table 1 is set on landscape pages" in err and "Table 1 is set on a landscape page (sidewaystable)" in err
    notes = (tmp_path / "out" / "notes.md").read_text(encoding="utf-8")
    assert "- results.docx: Table 1 is set on landscape pages" in notes and "- results.tex: Table 1 is set on a landscape page" in notes


def test_assumption_checks_and_cautions_reach_the_run_notes(tmp_path, capsys):
    """An analysis's assumption checks and cautions had been only in the records: pingouin's anova2_unbalanced (cells of
    4, 1, 1 and 4 cases) gives the unequal cells, the single-case cells and the small cells, once each although three
    records (one per term) carry them, on the terminal and in the run's notes; nothing of them enters the manuscript."""
    pg.read_dataset("anova2_unbalanced").to_csv(tmp_path / "diet.csv", index=False)
    path = write(tmp_path, '[data]\npath = "diet.csv"\n\n[[analyses]]\nid = "diet_exercise"\nkind = "factorial_anova"\n'
                 'outcome = "Scores"\nfactors = ["Diet", "Exercise"]\n\n[outputs]\nfolder = "out"\nmd = "results.md"\nnotes = "notes.md"\n')
    assert main(["run", str(path)]) == 0
    printed = capsys.readouterr().out
    notes = (tmp_path / "out" / "notes.md").read_text(encoding="utf-8")
    for start in ("diet_exercise: Cell sizes are unequal (1 to 4 cases", "diet_exercise: 2 cell(s) hold a single case",
                  "diet_exercise: 4 of 4 cells have fewer than 5 cases"):
        assert printed.count(start) == 1 and notes.count(f"- {start}") == 1
    assert "Cell sizes" not in (tmp_path / "out" / "results.md").read_text(encoding="utf-8")
