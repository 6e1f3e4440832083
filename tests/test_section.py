"""A results section as a reader meets it (issue 16, points 5-7): where each
analysis goes, callouts, run notes, whole tables placed in a chapter by
marker and numbered in document order, and the manuscript page of the style.

Data: the Palmer penguins as pingouin bundles them (Gorman, Williams &
Fraser, 2014). Page sizes and positions are read from LibreOffice's PDF of
the Word file (pdfinfo, pdftotext -bbox), as a reader would see them.
"""

from __future__ import annotations

import re
import subprocess

import docx
import pingouin as pg
import pytest

from statsetter.cli import main
from statsetter.plan import PlanError, load_plan, run_plan
from test_docx import office

PLAN = """title = "Penguins"
[data]
path = "penguins.csv"
labels = { body_mass_g = "body mass", flipper_length_mm = "flipper length", bill_length_mm = "bill length" }

[[analyses]]
id = "mass_by_sex"
kind = "t_independent"
outcome = "body_mass_g"
group = "sex"

[[analyses]]
id = "flipper_by_sex"
kind = "t_independent"
outcome = "flipper_length_mm"
group = "sex"
place = "both"

[[analyses]]
id = "bill_by_sex"
kind = "mann_whitney"
outcome = "bill_length_mm"
group = "sex"

[[analyses]]
id = "mass_pairs"
kind = "posthoc"
outcome = "body_mass_g"
group = "species"
adjust = "tukey"

[[analyses]]
id = "sizes"
kind = "correlation_matrix"
columns = ["body_mass_g", "flipper_length_mm", "bill_length_mm"]

[[tables]]
id = "sample"
kind = "descriptives"
variables = ["body_mass_g", "species"]
group = "sex"

[[tables]]
id = "by_sex"
kind = "results"
title = "Size by sex"
analyses = ["mass_by_sex", "flipper_by_sex"]

[outputs]
folder = "out"
md = "results.md"
docx = "results.docx"
PAPER
"""


@pytest.fixture
def folder(tmp_path):
    pg.read_dataset("penguins").to_csv(tmp_path / "penguins.csv", index=False)
    return tmp_path


def plan_file(folder, text=PLAN, paper=""):
    path = folder / "plan.toml"
    path.write_text(text.replace("PAPER", paper), encoding="utf-8")
    return path


def test_each_analysis_goes_where_the_plan_places_it(folder, capsys):
    path = plan_file(folder)
    result = run_plan(load_plan(path))
    assert main(["run", str(path)]) == 0
    md = (folder / "out" / "results.md").read_text(encoding="utf-8").replace("\u00a0", " ")
    paragraphs = [p for p in md.split("\n\n") if not p.startswith(("|", "**Table", "*Note", "#", "*", "\\*", "^"))]
    # an analysis a table shows is not repeated in the text (mass_by_sex); place = "both" writes both (flipper_by_sex)
    assert not any("body mass was" in p.lower() and "t(" in p for p in paragraphs)
    assert sum("flipper length" in p.lower() and "*t*(" in p for p in paragraphs) == 1
    # each table is called out once, numbered in the order the section shows it
    numbers = [int(n) for n in re.findall(r"^\*\*Table (\d+)\*\*$", md, flags=re.M)]
    assert numbers == list(range(1, len(numbers) + 1)) == [t.number for t in result.tables]
    for n in numbers:
        assert len(re.findall(rf"(?<!\*\*)Table {n} (gives|describes)", md)) == 1
    assert md.index("Table 1 describes the sample by sex.") < md.index("**Table 1**")
    # an analysis that is not in a table keeps its sentence (bill_by_sex: Mann-Whitney)
    assert any("Mann–Whitney *U*" in p for p in paragraphs)


def test_post_hoc_pairs_and_matrices_get_a_table_and_one_summary(folder):
    path = plan_file(folder)
    result = run_plan(load_plan(path))
    pairs = [r for r in result.records if (r.id or "").startswith("mass_pairs:")]
    below = [r for r in pairs if r.p < r.alpha]
    text = "\n".join(b.plain() for b in result.blocks if hasattr(b, "plain")).replace("\u00a0", " ")
    # one summary sentence counts the pairs below alpha from the records themselves (no pair has its own sentence)
    words = {2: "two", 3: "three"}
    said = "all" if len(below) == len(pairs) else words[len(below)]
    assert f"Of the three pairwise comparisons of body mass by species (Tukey HSD), {said} had an adjusted p below .05" in text
    assert not any(f"{r.groups[0].label} and {r.groups[1].label} differed" in text for r in pairs)
    titles = [t.title.text for t in result.tables]
    assert "Pairwise comparisons of body mass by species (Tukey HSD)" in titles
    table = next(t for t in result.tables if t.title.text.startswith("Pairwise"))
    assert [r.stub.text for r in table.rows] == [f"{r.groups[0].label} vs. {r.groups[1].label}" for r in pairs]
    # the matrix without a table in the plan gets one; both choices are shown in the run's notes
    assert any(t.stub_head.text == "Variable" and len(t.rows) == 3 and "1. Body mass" in t.rows[0].stub.text for t in result.tables)
    assert any(n.startswith("mass_pairs: shown in a table made for it") for n in result.notes)
    assert any(n.startswith("sizes: shown in a table made for it") for n in result.notes)


def test_run_notes_hold_the_tools_notes_and_the_caution(folder):
    path = plan_file(folder)
    assert main(["run", str(path)]) == 0
    notes = (folder / "out" / "run-notes.md").read_text(encoding="utf-8")
    md = (folder / "out" / "results.md").read_text(encoding="utf-8")
    assert "qualified statistician" in notes and "shown in a table made for it" in notes
    assert "qualified statistician" not in md and "shown in a table made for it" not in md
    with_caution = PLAN.replace("[outputs]\n", "[outputs]\ncaution = true\n")
    assert main(["run", str(plan_file(folder, with_caution))]) == 0
    assert "qualified statistician" in (folder / "out" / "results.md").read_text(encoding="utf-8")


@pytest.mark.parametrize(
    "change,message",
    [
        (('place = "both"', 'place = "table-only"'), r"line 17 \(analyses\[1\]\.place\): 'table-only' is not one of text, table, both"),
        (('id = "bill_by_sex"', 'id = "table"'), r"analyses\[2\]\.id\): 'table' is kept for the chapter markers"),
        (('id = "by_sex"', 'id = "sample"'), r"tables\[1\]\.id\): 'sample': a table id is used once"),
        (("[outputs]\n", '[outputs]\npaper = "legal"\n'), r"outputs\.paper\): 'legal' is not one of letter, a4"),
    ],
)
def test_bad_placements_name_the_line(folder, change, message):
    with pytest.raises(PlanError, match=message):
        load_plan(plan_file(folder, PLAN.replace(*change)))


def _chapter(path):
    d = docx.Document()
    d.add_paragraph("As [[ref:sizes]] shows, the sizes go together; [[ref:sample]] describes the birds.")
    d.add_paragraph("[[table:sample]]")
    d.add_paragraph("Between the tables [[mass_by_sex]].")
    d.add_paragraph("[[table:sizes]]")
    d.add_paragraph("[[ref:nowhere]] stays.")
    d.save(str(path))


def test_tables_by_marker_numbered_in_the_chapters_order(folder):
    _chapter(folder / "chapter.docx")
    text = PLAN + '[chapter]\npath = "chapter.docx"\nout = "filled.docx"\n'
    path = plan_file(folder, text)
    assert main(["run", str(path)]) == 1  # an unknown marker ([[ref:nowhere]]) is reported with exit 1
    d = docx.Document(str(folder / "out" / "filled.docx"))
    paras = [p.text for p in d.paragraphs]
    # the reference before the tables follows the chapter's order (sample is Table 1 there, sizes Table 2)
    assert paras[0] == "As Table 2 shows, the sizes go together; Table 1 describes the birds."
    # a paragraph that held only the marker is replaced by the number, title, table and notes
    assert "[[table:sample]]" not in "".join(paras) and "" not in paras[:3]
    assert paras[1] == "Table 1" and d.paragraphs[1].runs[0].bold and d.paragraphs[1].paragraph_format.keep_with_next
    assert paras[2].startswith("Characteristics of the Sample by Sex")
    assert len(d.tables) == 2 and d.tables[0].rows[0].cells[0].text in ("", "Variable")
    t2 = paras.index("Table 2")
    assert paras[t2 + 1].startswith("Correlations") and any(p.startswith("Note.") for p in paras[t2:])
    assert paras[-1] == "[[ref:nowhere]] stays."


def _pdf(path):
    subprocess.run([office(), "--headless", "--convert-to", "pdf", "--outdir", str(path.parent), str(path)],
                   check=True, capture_output=True, timeout=180, env={"HOME": str(path.parent), "PATH": "/usr/bin:/bin"})
    return path.with_suffix(".pdf")


@pytest.mark.parametrize("paper,points", [("", (612, 792)), ('paper = "a4"', (595, 842))])
def test_the_manuscript_page_of_the_style(folder, paper, points):
    # APA 7 manuscript (§2.18-2.27, memory): 1-inch margins, Times New Roman 12 pt, double spacing,
    # 0.5-inch first-line indent, Level 1 heading centred bold, page number top right; A4 on request
    path = plan_file(folder, paper=paper)
    assert main(["run", str(path)]) == 0
    out = folder / "out" / "results.docx"
    d = docx.Document(str(out))
    section = d.sections[0]
    assert {section.left_margin.inches, section.right_margin.inches, section.top_margin.inches, section.bottom_margin.inches} == {1.0}
    normal = d.styles["Normal"]
    assert normal.font.name == "Times New Roman" and normal.font.size.pt == 12
    assert normal.paragraph_format.line_spacing == 2.0 and normal.paragraph_format.first_line_indent.inches == 0.5
    heading = d.styles["Heading 1"]
    assert heading.font.bold and heading.font.color.rgb == docx.shared.RGBColor(0, 0, 0) and heading.paragraph_format.alignment == 1
    assert "PAGE" in section.header._element.xml
    pdf = _pdf(out)
    info = subprocess.run(["pdfinfo", str(pdf)], check=True, capture_output=True, text=True).stdout
    size = re.search(r"Page size:\s+([\d.]+) x ([\d.]+) pts", info)
    assert (round(float(size.group(1))), round(float(size.group(2)))) == points
    fonts = subprocess.run(["pdffonts", str(pdf)], check=True, capture_output=True, text=True).stdout
    assert "Serif" in fonts or "Times" in fonts  # Times New Roman, or LibreOffice's metric-compatible Liberation Serif
    pages = subprocess.run(["pdftotext", "-layout", str(pdf), "-"], check=True, capture_output=True, text=True).stdout.split("\f")
    assert pages[1].strip().splitlines()[0].strip() == "2"  # the page number heads page 2


def test_numbers_align_on_the_decimal_mark_when_rendered(folder):
    # issue 16, point 2: in the post hoc table the p column holds ".970"-like values and "< .001";
    # aligned on the mark, every value's right edge falls at one place (each has three decimals)
    path = plan_file(folder)
    assert main(["run", str(path)]) == 0
    pdf = _pdf(folder / "out" / "results.docx")
    html = subprocess.run(["pdftotext", "-bbox", str(pdf), "-"], check=True, capture_output=True, text=True).stdout
    words = re.findall(r'<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="[\d.]+">([^<]*)</word>', html)
    rows = [w for w in words if re.fullmatch(r"\.\d{3}", w[3])]
    right = {}
    for x0, y, x1, text in rows:  # the p values of one table share a column: group them by right edge within 0.5 pt
        right.setdefault(round(float(x1) * 2) / 2, []).append(text)
    assert max(len(v) for v in right.values()) >= 3, right  # the three pairs' p values (two "< .001" and one exact) line up
