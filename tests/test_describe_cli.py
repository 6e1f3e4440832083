"""``statsetter describe``: every data format, every table format, bad files.

Data: the Palmer penguins as bundled with pingouin (Gorman, Williams &
Fraser, 2014); the counts checked are the palmerpenguins package's published
summary (recalled from memory): 152 Adelie, 68 Chinstrap, 124 Gentoo.
"""

from __future__ import annotations

import statistics

import docx
import pandas as pd
import pingouin as pg
import pytest

from statsetter.cli import main
from test_docx import pdf_text


@pytest.fixture(scope="module")
def files(tmp_path_factory):
    folder = tmp_path_factory.mktemp("data")
    frame = pg.read_dataset("penguins")
    frame.to_csv(folder / "penguins.csv", index=False)
    frame.to_excel(folder / "penguins.xlsx", index=False, sheet_name="birds")
    frame.to_parquet(folder / "penguins.parquet")
    frame.to_stata(folder / "penguins.dta", write_index=False)
    pyreadstat = pytest.importorskip("pyreadstat")
    pyreadstat.write_sav(frame, str(folder / "penguins.sav"))
    return folder


@pytest.mark.parametrize("name", ["penguins.csv", "penguins.xlsx", "penguins.parquet", "penguins.dta", "penguins.sav"])
def test_every_data_format(files, name, capsys):
    assert main(["describe", str(files / name), "--group", "species", "--vars", "sex,body_mass_g", "--out", str(files / f"{name}.md")]) == 0
    captured = capsys.readouterr()
    assert "level: sex: nominal (" in captured.err
    md = (files / f"{name}.md").read_text(encoding="utf-8").replace("\u00a0", " ")  # "(n = 152)" is kept together by no-break spaces
    assert "Adelie (*n* = 152)" in md and "Chinstrap (*n* = 68)" in md and "Gentoo (*n* = 124)" in md
    assert "| &nbsp;&nbsp;&nbsp;&nbsp;female | 73 (50.0) | 34 (50.0) | 58 (48.7) | 165 (49.5) |" in md


@pytest.mark.parametrize("suffix,probe", [(".html", "<table"), (".tex", "\\toprule"), (".csv", "Variable,"), (".txt", "Table 1")])
def test_extension_picks_the_format(files, suffix, probe, capsys):
    out = files / f"table{suffix}"
    assert main(["describe", str(files / "penguins.csv"), "--vars", "island", "--out", str(out)]) == 0
    assert probe in out.read_text(encoding="utf-8")


def test_docx_table_opens_in_libreoffice(files, capsys):
    out = files / "table1.docx"
    assert main(["describe", str(files / "penguins.csv"), "--group", "sex", "--compare", "--smd", "--vars", "species,body_mass_g", "--out", str(out)]) == 0
    table = docx.Document(str(out)).tables[0]
    assert [row.cells[0].text for row in table.rows[:2]].count("Variable") == 1  # the stub head, under the spanner row
    text = pdf_text(out)
    assert "Adelie" in text and "SMD" in text and "Welch" in text


def test_weak_guess_is_a_warning(tmp_path, capsys):
    path = tmp_path / "rating.csv"
    path.write_text("rating\n1\n2\n3\n4\n5\n3\n", encoding="utf-8")
    assert main(["describe", str(path)]) == 0
    captured = capsys.readouterr()
    assert "warning: rating: ordinal (inferred from the values: integer, 5 distinct values 1–5; a weak guess: declare the level)" in captured.err
    assert "Mdn (IQR)" in captured.out
    assert main(["describe", str(path), "--level", "rating=interval"]) == 0
    assert "level: rating: interval (declared)" in capsys.readouterr().err


def test_missing_codes(tmp_path, capsys):
    path = tmp_path / "codes.csv"
    path.write_text("x\n1.5\n-99\n2.5\n3.25\n", encoding="utf-8")
    assert main(["describe", str(path), "--missing", "-99"]) == 0
    out = capsys.readouterr().out
    kept = [1.5, 2.5, 3.25]  # reference: Python's statistics module
    assert f"{statistics.mean(kept):.2f} ({statistics.stdev(kept):.2f})" in out and "Missing" in out


@pytest.mark.parametrize(
    "setup,args,message",
    [
        (lambda d: None, ["--vars", "body_mas"], "body_mas: no such column; did you mean body_mass_g"),
        (lambda d: None, ["--group", "specie"], "specie: no such column; did you mean species"),
        (lambda d: None, ["--weights", "body_mass_g"], "missing weight(s)"),
        (lambda d: None, ["--level", "sex"], "--level: expected NAME=VALUE"),
        (lambda d: None, ["--out", "x.pdf"], "unknown extension"),
        (lambda d: None, ["--sheet", "nope"], ""),
    ],
)
def test_bad_options(files, setup, args, message, capsys, tmp_path):
    source = files / ("penguins.xlsx" if "--sheet" in args else "penguins.csv")
    assert main(["describe", str(source), *args]) == 2
    err = capsys.readouterr().err
    assert message in err and "Traceback" not in err and len(err.strip().splitlines()) <= 2
    if "--sheet" in args:
        assert "no sheet 'nope'; sheets: birds" in err


@pytest.mark.parametrize(
    "name,content,message",
    [
        ("renamed.xlsx", b"species,sex\nA,f\n", "not an Excel .xlsx workbook"),
        ("renamed.sav", b"species,sex\nA,f\n", "not an SPSS .sav file"),
        ("renamed.parquet", b"species,sex\nA,f\n", "not a Parquet file"),
        ("renamed.dta", b"species,sex\nA,f\n", "not a Stata .dta file"),
        ("binary.csv", b"PK\x03\x04\x00\x00binary", "binary contents, not CSV"),
        ("empty.csv", b"", "the file is empty"),
        ("latin1.csv", "name\nJos\u00e9\n".encode("latin-1"), "not utf-8 text"),
        ("data.json", b"{}", "unknown data format '.json'"),
        ("broken.xlsx", b"PK\x03\x04 not really a zip", "cannot read as Excel"),
    ],
)
def test_bad_files_clear_error_nothing_written(tmp_path, name, content, message, capsys):
    path = tmp_path / name
    path.write_bytes(content)
    out = tmp_path / "out.md"
    assert main(["describe", str(path), "--out", str(out)]) == 2
    err = capsys.readouterr().err
    assert message in err and "Traceback" not in err
    assert not out.exists()
    assert path.read_bytes() == content


def test_latin1_with_encoding(tmp_path, capsys):
    path = tmp_path / "latin1.csv"
    path.write_bytes("name\nJos\u00e9\nAnn\n".encode("latin-1"))
    assert main(["describe", str(path), "--encoding", "latin-1"]) == 0
    assert "José" in capsys.readouterr().out


def test_no_file(tmp_path, capsys):
    assert main(["describe", str(tmp_path / "absent.csv")]) == 2
    assert "no such file" in capsys.readouterr().err


def test_output_never_overwrites_the_data(files, capsys):
    source = files / "penguins.csv"
    before = source.read_bytes()
    copy = files / "same.txt"
    copy.write_bytes(before)
    assert main(["describe", str(copy), "--out", str(copy)]) == 2
    assert "overwrite an input" in capsys.readouterr().err
    assert copy.read_bytes() == before
    assert pd.read_csv(source).shape == (344, 7)


def test_an_id_column_is_left_out_unless_named(tmp_path, capsys):
    # a column with one text value per row is an identifier, not a variable: tabulating it
    # would give one row per case (common practice: Table 1 describes variables, never IDs);
    # leaving it out is said on standard error, and naming it brings it back
    frame = pg.read_dataset("penguins")[["species", "island", "body_mass_g"]]
    frame.insert(0, "bird", [f"P{i:03d}" for i in range(len(frame))])
    path = tmp_path / "birds.csv"
    frame.to_csv(path, index=False)
    assert main(["describe", str(path), "--group", "species"]) == 0
    out = capsys.readouterr()
    assert "left out: bird: nominal" in out.err and "looks like an identifier" in out.err
    assert "P001" not in out.out and "Island" in out.out
    assert main(["describe", str(path), "--vars", "bird,island"]) == 0
    assert "P001" in capsys.readouterr().out
    # a case number (every integer from 1 to n once) is an identifier too, not a ratio variable
    frame.insert(0, "case", range(1, len(frame) + 1))
    frame.to_csv(path, index=False)
    assert main(["describe", str(path)]) == 0
    out = capsys.readouterr()
    assert "left out: case: nominal (inferred from the values: integer, every value distinct and consecutive (1–344)" in out.err
    assert "case" not in out.out.split("Note.")[0].replace("cases", "")


def test_labels_with_latex_specials_compile(tmp_path, capsys):
    """The penguins' species renamed to labels full of LaTeX's special characters (% & # _ $ { } ~ ^ \\) and a
    measurement named "50% & more": the Table 1 written as .tex compiles with pdflatex under statsetter's own preamble
    and its text reads back (CI=true requires pdflatex, as the demo's LaTeX test does)."""
    import os
    import shutil
    import subprocess

    if shutil.which("pdflatex") is None or shutil.which("pdftotext") is None:
        if os.environ.get("CI"):
            pytest.fail("pdflatex and pdftotext are required in CI; .ci/run installs them")
        pytest.skip("pdflatex not installed")
    from statsetter.export.section import _latex_head
    from statsetter.style import load_style

    names = {"Adelie": "a_b & 50% #1", "Chinstrap": "$5 {x} ~y^2", "Gentoo": "back\\slash \\textbf{z}"}
    penguins = pg.read_dataset("penguins").dropna().assign(species=lambda d: d.species.map(names))
    penguins.rename(columns={"bill_length_mm": "50% & more"}).to_csv(tmp_path / "d.csv", index=False)
    assert main(["describe", str(tmp_path / "d.csv"), "--group", "species", "--compare", "--vars", "50% & more,sex", "--out", str(tmp_path / "t.tex")]) == 0
    body = (tmp_path / "t.tex").read_text(encoding="utf-8")
    (tmp_path / "w.tex").write_text(_latex_head(load_style("apa7"), None) + body + "\n\\end{document}\n", encoding="utf-8")
    done = subprocess.run(["pdflatex", "-interaction=nonstopmode", "-halt-on-error", "w.tex"], cwd=tmp_path, capture_output=True, text=True, timeout=300)
    assert done.returncode == 0, done.stdout[-2000:]
    text = subprocess.run(["pdftotext", str(tmp_path / "w.pdf"), "-"], check=True, capture_output=True, text=True).stdout
    assert "50% & more" in text and "#1" in text and "$5" in text and "back\\slash" in text, text
