"""`statsetter records` lists ids, `render --id` picks by them, and the former
names of describe's options and of plan keys still work for one release,
with a warning naming the new name (and the plan's line)."""

from __future__ import annotations

import pingouin as pg
import pytest

from statsetter.analyses import correlation_matrix, describe, linear_regression
from statsetter.cli import main
from statsetter.records import dump_records, name_records


@pytest.fixture(scope="module")
def penguins():
    return pg.read_dataset("penguins")


@pytest.fixture
def records_file(tmp_path, penguins):
    records = name_records("mass", linear_regression(penguins, "body_mass_g", ["flipper_length_mm", "species"]))
    records += name_records("bills", correlation_matrix(penguins, ["bill_length_mm", "bill_depth_mm"]))
    records += name_records("table_1", describe(penguins, ["body_mass_g"], group="sex"))
    path = tmp_path / "records.json"
    path.write_text(dump_records(records), encoding="utf-8")
    return path


def test_records_lists_every_id_with_a_description(records_file, capsys):
    assert main(["records", str(records_file)]) == 0
    lines = capsys.readouterr().out.splitlines()
    ids = [line.split()[0] for line in lines]
    assert ids == ["mass", "mass:intercept", "mass:flipper_length_mm", "mass:species.Chinstrap", "mass:species.Gentoo", "bills",
                   "bills:bill_length_mm~bill_depth_mm", "table_1"]
    assert "linear regression model" in lines[0] and "n = 342" in lines[0]  # 344 penguins, 2 without flipper length
    assert "intercept" in lines[1].lower() and "species = Chinstrap" in lines[3]
    assert "correlation matrix of 2 variables" in lines[5] and "descriptives of 1 variable(s) by sex" in lines[7]


def test_render_by_id_exact_or_a_whole_analysis(records_file, capsys):
    assert main(["render", str(records_file), "--id", "mass:flipper_length_mm", "--form", "sentence"]) == 0  # one record
    out = capsys.readouterr().out
    assert out.count("\n") == 1 and "flipper_length_mm" in out and "B = " in out
    assert main(["render", str(records_file), "--id", "mass", "--table", "auto", "--to", "md"]) == 0
    table = capsys.readouterr().out
    assert "**Table 1**" in table and table.count("Chinstrap") == 1 and "*SE*" in table  # the model and its parts: a coefficients table
    assert main(["render", str(records_file), "--id", "table_1", "--to", "md"]) == 0
    assert "*N*\u00a0=\u00a0333" in capsys.readouterr().out  # a Description renders as its table (11 penguins without a sex left out)
    assert main(["render", str(records_file), "--id", "mas"]) == 2
    assert "no record 'mas'; did you mean mass" in capsys.readouterr().err


def test_describe_former_option_names_warn_and_work(tmp_path, penguins, capsys):
    data = tmp_path / "p.csv"
    penguins.to_csv(data, index=False)
    assert main(["describe", str(data), "--vars", "body_mass_g", "--group", "sex", "--compare"]) == 0
    now = capsys.readouterr()
    assert main(["describe", str(data), "--vars", "body_mass_g", "--by", "sex", "--tests"]) == 0
    before = capsys.readouterr()
    assert before.out == now.out
    assert "--by is now --group" in before.err and "--tests is now --compare" in before.err
    assert main(["describe", str(data), "--by", "sex", "--group", "sex"]) == 2
    assert "former name of --group" in capsys.readouterr().err


def test_plan_former_keys_warn_with_their_line(tmp_path, penguins, capsys):
    penguins.to_csv(tmp_path / "p.csv", index=False)
    plan = tmp_path / "plan.toml"
    plan.write_text('[data]\npath = "p.csv"\n\n[[analyses]]\nid = "pairs"\nkind = "posthoc"\noutcome = "body_mass_g"\ngroup = "species"\n'
                    'procedure = "holm"\n\n[[tables]]\nkind = "descriptives"\nvariables = ["body_mass_g"]\nby = "sex"\n\n'
                    '[outputs]\nfolder = "out"\nmd = "r.md"\n', encoding="utf-8")
    assert main(["run", str(plan)]) == 0
    err = capsys.readouterr().err
    assert "plan.toml, line 9: 'procedure' is now 'adjust'" in err
    assert "plan.toml, line 14: 'by' is now 'group'" in err
    text = (tmp_path / "out" / "r.md").read_text(encoding="utf-8")
    assert "Holm" in text and "by Sex" in text.replace("by sex", "by Sex")


def test_a_chapter_marker_names_a_part_by_its_id(tmp_path, records_file):
    # [[model:term]] and [[matrix:x~y]] are markers like any other: filled from the record of that id
    import docx

    chapter = tmp_path / "chapter.docx"
    d = docx.Document()
    d.add_paragraph("Flipper length predicted mass, [[mass:flipper_length_mm]]; bills: [[bills:bill_length_mm~bill_depth_mm]].")
    d.save(chapter)
    out = tmp_path / "filled.docx"
    assert main(["fill", str(chapter), "--records", str(records_file), "--out", str(out)]) == 0
    text = docx.Document(out).paragraphs[0].text.replace("\u00a0", " ")
    assert "[[" not in text and "B = " in text and "r(340) = −.24" in text
