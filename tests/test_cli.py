"""The command line: format, render, styles; bad input gives one or two lines and exit 2."""

import json
import subprocess
import sys

import pytest

from kind_examples import EXAMPLES
from statsetter import dump_records
from statsetter.cli import main


def run(*args):
    proc = subprocess.run([sys.executable, "-m", "statsetter", *args], capture_output=True, text=True)
    return proc.returncode, proc.stdout, proc.stderr


def test_format_t(capsys):
    # REPORTING-RULES, t test example (APA 7 ch. 6)
    assert main(["format", "t", "--stat", "2.14", "--df", "38", "--p", "0.039", "--effect", "d=0.68", "--effect-ci", "0.04,1.31"]) == 0
    assert capsys.readouterr().out == "t(38) = 2.14, p = .039, d = 0.68, 95% CI [0.04, 1.31]\n"


def test_format_computes_p(capsys):
    # scipy.stats.t: two-sided p of t(38) = 2.14 is 0.0388 -> .039
    assert main(["format", "t", "--stat", "2.14", "--df", "38", "--to", "md"]) == 0
    assert capsys.readouterr().out == "*t*(38)\u00a0=\u00a02.14, *p*\u00a0=\u00a0.039\n"  # no-break spaces inside a statistic (APA style profile)


def test_format_into_word(tmp_path, capsys):
    # --out FILE.docx is a Word document (italic symbols as runs), not text under a .docx name
    from test_docx import pdf_text

    out = tmp_path / "one.docx"
    assert main(["format", "t", "--stat", "2.14", "--df", "38", "--p", "0.039", "--out", str(out)]) == 0
    assert "t(38) = 2.14, p = .039" in pdf_text(out)


def test_format_warns_when_p_does_not_follow_from_the_statistic(capsys):
    # the recomputed p of t(38) = 2.14 is .0388 (scipy.stats.t.sf; a handbook t table puts
    # the two-sided .05 critical value of t(38) near 2.02, recalled from memory): p = .20 cannot be it
    from scipy import stats

    assert 2 * stats.t.sf(2.14, 38) == pytest.approx(0.0388, abs=5e-5)
    assert main(["format", "t", "--stat", "2.14", "--df", "38", "--p", "0.2"]) == 0
    out = capsys.readouterr()
    assert out.out.strip() == "t(38) = 2.14, p = .200"  # rendered as given
    assert "warning: p = 0.2 does not follow from t(38) = 2.14" in out.err
    main(["format", "t", "--stat", "2.14", "--df", "38", "--p", "0.039"])
    assert capsys.readouterr().err == ""
    main(["format", "t", "--stat", "2.14", "--df", "38", "--p", "0.0195"])
    assert "fits a one-sided test" in capsys.readouterr().err
    main(["format", "t", "--stat", "2.14", "--df", "38", "--p", "0.0195", "--alternative", "greater"])
    assert capsys.readouterr().err == ""
    main(["format", "chi2", "--stat", "9.87", "--df", "2", "--n", "200", "--p", "0.007"])  # APA's example pair
    assert capsys.readouterr().err == ""


def test_format_negative_ci_and_style(capsys):
    assert main(["format", "welch-t", "--stat=-1.86", "--df", "17.78", "--p", "0.0796", "--style", "ama11"]) == 0
    assert capsys.readouterr().out == "t\u2081\u2087.\u2087\u2088 = \u22121.86, P = .08\n"  # AMA 11: df as a subscript (memory)


def test_render_files(tmp_path, capsys):
    a = tmp_path / "a.json"
    b = tmp_path / "b.json"
    a.write_text(dump_records([EXAMPLES["pearson"]]))
    b.write_text(dump_records([EXAMPLES["chi2_independence"]]))
    out = tmp_path / "out.md"
    assert main(["render", str(a), str(b), "--to", "md", "--out", str(out)]) == 0
    text = out.read_text().replace("\u00a0", " ")  # the no-break spaces inside statistics read as spaces here
    assert "*r*(98) = .32" in text and "χ^2^(2, *N* = 200) = 9.87" in text


def test_out_s_extension_picks_the_format_unless_to_says_otherwise(tmp_path, capsys):
    """--out x.tex without --to writes LaTeX (plain text had been written under the .tex name, and pdflatex stopped at
    its box-drawing rules); a --to that the extension contradicts is refused, naming both (found by rendering records
    with random text to every format)."""
    a = tmp_path / "a.json"
    a.write_text(dump_records([EXAMPLES["pearson"]]))
    for ext, mark in ((".tex", "\\textit{r}"), (".md", "*r*"), (".html", "<i>r</i>"), (".txt", "r(98)")):
        assert main(["render", str(a), "--out", str(tmp_path / f"o{ext}")]) == 0
        assert mark in (tmp_path / f"o{ext}").read_text(encoding="utf-8"), ext
    assert main(["format", "t", "--stat", "2.14", "--df", "38", "--out", str(tmp_path / "f.md")]) == 0
    assert (tmp_path / "f.md").read_text(encoding="utf-8").startswith("*t*(38)")
    capsys.readouterr()
    assert main(["render", str(a), "--to", "md", "--out", str(tmp_path / "clash.tex")]) == 2
    assert "--to md: --out" in capsys.readouterr().err and not (tmp_path / "clash.tex").exists()


def test_render_tables_from_records(tmp_path, capsys):
    # a co-author's records as one table: a results table (the p under a p head, without the symbol,
    # as a column head names its quantity: practice) and a regression's coefficients table, in text and Word
    import pingouin as pg

    from statsetter.analyses import linear_regression
    from test_docx import pdf_text

    records = tmp_path / "model.json"
    records.write_text(dump_records(linear_regression(pg.read_dataset("penguins"), "body_mass_g", ["flipper_length_mm", "sex"])))
    assert main(["render", str(records), "--table", "results", "--to", "md"]) == 0
    out = capsys.readouterr().out
    assert "| *p* |" in out and "| < .001 |" in out and "*p* <" not in out
    assert main(["render", str(records), "--table", "regression", "--title", "Body mass"]) == 0
    out = capsys.readouterr().out
    assert "Body Mass" in out and "female (ref.)" in out and "ref. = reference category" in out and "Flipper_length_mm" in out
    word = tmp_path / "table.docx"
    assert main(["render", str(records), "--table", "regression", "--out", str(word)]) == 0
    assert "Linear Regression" in pdf_text(word)
    sentences = tmp_path / "sentences.docx"
    assert main(["render", str(records), "--form", "sentence", "--out", str(sentences)]) == 0  # Word, a paragraph per record
    assert "holding the other predictors constant" in pdf_text(sentences)
    assert main(["render", str(records), "--title", "x"]) == 2
    assert "a title is for a table" in capsys.readouterr().err
    single = tmp_path / "pearson.json"
    single.write_text(dump_records([EXAMPLES["pearson"]]))
    assert main(["render", str(single), "--table", "regression"]) == 2
    assert "linear or of logistic regressions" in capsys.readouterr().err


def test_render_anova_table(tmp_path, capsys):
    import pingouin as pg

    from statsetter.analyses import factorial_anova

    path = tmp_path / "anova.json"
    path.write_text(dump_records(factorial_anova(pg.read_dataset("penguins"), "body_mass_g", ["species", "sex"])))
    assert main(["render", str(path), "--table", "anova", "--to", "md"]) == 0
    out = capsys.readouterr().out
    assert "| Source | *SS* | *df* | *MS* | *F* | *p* |" in out and "| Error | 31,302,628.28 | 327 | 95,726.69 |" in out


def test_render_refuses_an_empty_file(tmp_path, capsys):
    empty = tmp_path / "empty.json"
    empty.write_text("[]")
    assert main(["render", str(empty)]) == 2
    assert f"{empty}: holds no records" in capsys.readouterr().err


def test_render_refuses_to_overwrite_input(tmp_path, capsys):
    a = tmp_path / "a.json"
    a.write_text(dump_records([EXAMPLES["pearson"]]))
    before = a.read_text()
    assert main(["render", str(a), "--out", str(a)]) == 2
    assert "overwrite an input" in capsys.readouterr().err
    assert a.read_text() == before


def test_styles_list_show_check(tmp_path, capsys):
    assert main(["styles"]) == 0
    assert "apa7" in capsys.readouterr().out
    assert main(["styles", "show", "apa7"]) == 0
    assert "example: t(38) = \u22122.14" in capsys.readouterr().out
    bad = tmp_path / "bad.toml"
    bad.write_text('extends = "apa7"\n[numbers]\ndecimals = "two"\n')
    assert main(["styles", "check", str(bad)]) == 2
    err = capsys.readouterr().err
    assert "numbers.decimals" in err and "0 to 6" in err


@pytest.mark.parametrize(
    "args, message",
    [
        (["format", "t", "--stat", "2", "--df", "0"], "df[0]"),
        (["format", "t", "--p", "1.5"], "p: 1.5 is outside"),
        (["format", "nope"], "unknown KIND"),
        (["format", "t", "--effect", "d"], "NAME=VALUE"),
        (["format", "t", "--effect", "d=1", "--effect-ci", "2,1"], "above upper"),
        (["format", "t", "--style", "chicago"], "no built-in style"),
        (["render", "missing.json"], "no such file"),
        (["format", "t", "--stat", "x"], "invalid float"),
    ],
)
def test_bad_input_exit_2_no_traceback(args, message):
    code, out, err = run(*args)
    assert code == 2
    assert message in err
    assert "Traceback" not in err
    assert len(err.strip().splitlines()) <= 2


def test_render_bad_json(tmp_path):
    bad = tmp_path / "bad.json"
    bad.write_text(json.dumps([{"kind": "pearson", "p": 7}]))
    code, _, err = run("render", str(bad))
    assert code == 2 and "record 1: p: 7 is outside [0, 1]" in err and "Traceback" not in err


def test_light_start():
    # import statsetter, --help and format load none of the heavy libraries
    probe = (
        "import sys, statsetter\n"
        "from statsetter.cli import main\n"
        "main(['format', 't', '--stat', '2.14', '--df', '38', '--p', '0.039'])\n"
        "try:\n    main(['--help'])\nexcept SystemExit:\n    pass\n"
        "heavy = [m for m in ('pingouin', 'statsmodels', 'matplotlib', 'pandas') if m in sys.modules]\n"
        "print('HEAVY', heavy)\n"
    )
    proc = subprocess.run([sys.executable, "-c", probe], capture_output=True, text=True, check=True)
    assert "HEAVY []" in proc.stdout
