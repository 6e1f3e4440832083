"""Word output: runs, APA table layout (APA 7 §7.8-7.21) and real rendering.

Every .docx written here is converted to PDF by LibreOffice headless and read
back with pdftotext (poppler). In CI a missing LibreOffice fails the run.
"""

from statsetter import table
import os
import re
import shutil
import subprocess
import zipfile

import docx
import pytest
from docx.oxml.ns import qn

from kind_examples import EXAMPLES
from statsetter import StyledText, render
from statsetter.export.docx_writer import results_document, save_document
from test_tables import model

W = "{http://schemas.openxmlformats.org/wordprocessingml/2006/main}"


def office():
    """LibreOffice's soffice; the test fails in CI without it (and pdftotext), and is skipped elsewhere."""
    soffice = shutil.which("soffice") or shutil.which("libreoffice")
    if soffice is None or shutil.which("pdftotext") is None:
        if os.environ.get("CI"):
            pytest.fail("LibreOffice (soffice) and pdftotext are required in CI; .ci/run installs them")
        pytest.skip("LibreOffice or pdftotext not installed")
    return soffice


def pdf_text(path):
    soffice = office()
    out = path.parent
    subprocess.run([soffice, "--headless", "--convert-to", "pdf", "--outdir", str(out), str(path)],
                   check=True, capture_output=True, timeout=180, env={**os.environ, "HOME": str(out)})
    pdf = path.with_suffix(".pdf")
    return subprocess.run(["pdftotext", str(pdf), "-"], check=True, capture_output=True, text=True).stdout


@pytest.fixture
def written(tmp_path):
    records = [EXAMPLES["t_independent"], EXAMPLES["chi2_independence"]]
    doc = results_document(records, title="Results", tables=[model()])
    path = save_document(doc, tmp_path / "results.docx")
    assert "Table 1" in pdf_text(path)  # every .docx a test writes goes through LibreOffice
    return path, records


def test_italic_exactly_on_symbols(written):
    path, records = written
    doc = docx.Document(str(path))
    paragraph = doc.paragraphs[1]
    italic = [r.text for r in paragraph.runs if r.italic]
    # APA 7 §6.45: Latin statistical symbols italic; Greek and CI roman
    assert italic == ["M", "SD", "n", "M", "SD", "n", "t", "p", "d"]
    assert paragraph.text == render(records[0], "sentence").text
    chi = doc.paragraphs[2]
    sup = [r.text for r in chi.runs if r.font.superscript]
    assert sup == ["2"]  # χ² with a real superscript, not a typed caret


def test_table_rules_are_horizontal_only(written):
    path, _ = written
    xml = zipfile.ZipFile(path).read("word/document.xml").decode()
    doc = docx.Document(str(path))
    tbl = doc.tables[0]._tbl
    # no vertical rules anywhere
    for borders in [*tbl.iter(f"{W}tblBorders"), *tbl.iter(f"{W}tcBorders")]:  # (tblCellMar's left/right are margins)
        for edge in ("left", "right", "insideV"):
            for el in borders.findall(f"{W}{edge}"):
                assert el.get(qn("w:val")) == "nil"
    rows = tbl.findall(f"{W}tr")
    def ruled(row, edge):  # a cell without borders of its own has the table's: none
        found = [c.find(f"{W}tcPr/{W}tcBorders/{W}{edge}") for c in row.findall(f"{W}tc")]
        return [el is not None and el.get(qn("w:val")) == "single" for el in found]
    assert all(ruled(rows[0], "top"))  # above the column heads
    assert all(ruled(rows[1], "bottom"))  # below the column heads
    assert all(ruled(rows[-1], "bottom"))  # at the bottom
    assert ruled(rows[0], "bottom")[1:] == [True, True]  # under each spanner (merged cells)
    assert not any(ruled(rows[-1], "top")) or len(rows) == 3
    assert xml.count("<w:tblHeader/>") == 2 and xml.count("<w:cantSplit/>") == len(rows)


def test_table_cells_take_one_paragraph_style(written, tmp_path):
    # one style for table text instead of the same direct formatting on every cell (practice: Word's own table
    # styles work so): based on the text's default style, single-spaced with no space around and no first-line
    # indent whatever Normal says (the manuscript page's Normal is double-spaced and indented), kept with the next
    from statsetter.export.docx_writer import add_table, add_table_text_style

    path, _ = written
    doc = docx.Document(str(path))
    style = doc.styles.element.get_by_id("StatsetterTableText")
    assert style is not None and style.find(f"{W}basedOn").get(qn("w:val")) == "Normal"
    spacing = style.find(f"{W}pPr/{W}spacing")
    assert (spacing.get(qn("w:line")), spacing.get(qn("w:before")), spacing.get(qn("w:after"))) == ("240", "0", "0")
    assert style.find(f"{W}pPr/{W}ind").get(qn("w:firstLine")) == "0" and style.find(f"{W}pPr/{W}keepNext") is not None
    cells = list(doc.tables[0]._tbl.iter(f"{W}tc"))
    assert cells and all(p.find(f"{W}pPr/{W}pStyle").get(qn("w:val")) == "StatsetterTableText" for c in cells for p in c.iter(f"{W}p"))

    # a house style's table line spacing gets a style of its own; a style already in the document (edited by its
    # author, say) is kept as it is and not added twice
    house = tmp_path / "double.toml"
    house.write_text('name = "double"\nextends = "apa7"\n[manuscript]\ntable_line_spacing = 2.0\n', encoding="utf-8")
    doc = docx.Document()
    add_table(doc, model(), str(house))
    add_table(doc, model(), str(house))
    ids = [s.get(qn("w:styleId")) for s in doc.styles.element.findall(f"{W}style")]
    assert ids.count("StatsetterTableText480") == 1 and "StatsetterTableText" not in ids
    assert doc.styles.element.get_by_id("StatsetterTableText480").find(f"{W}pPr/{W}spacing").get(qn("w:line")) == "480"
    # LibreOffice writes its Normal style without marking it default: the table text is still based on it
    libre = docx.Document()
    for st in libre.styles.element.findall(f"{W}style"):
        st.attrib.pop(qn("w:default"), None)
    add_table_text_style(libre, 240)
    assert libre.styles.element.get_by_id("StatsetterTableText").find(f"{W}basedOn").get(qn("w:val")) == "Normal"
    edited = doc.styles.element.get_by_id("StatsetterTableText480")
    edited.find(f"{W}pPr/{W}spacing").set(qn("w:line"), "360")
    assert add_table_text_style(doc, 480) == "StatsetterTableText480"
    assert doc.styles.element.get_by_id("StatsetterTableText480").find(f"{W}pPr/{W}spacing").get(qn("w:line")) == "360"


def test_table_number_title_and_note(written):
    path, _ = written
    doc = docx.Document(str(path))
    texts = [p.text for p in doc.paragraphs]
    i = texts.index("Table 1")
    assert doc.paragraphs[i].runs[0].bold
    # APA 7 §7.7: italic title case (minor words of three letters or fewer lowercase, §6.17)
    assert texts[i + 1] == "Scores by Group" and all(r.italic for r in doc.paragraphs[i + 1].runs)
    note = doc.paragraphs[i + 2]
    assert note.runs[0].text == "Note." and note.runs[0].italic


def test_libreoffice_renders_the_numbers(written):
    path, _ = written
    text = pdf_text(path)
    for needed in ("t(38) = 2.14", "p = .039", "95% CI [0.04, 1.31]", "N = 200) = 9.87", "Table 1", "Scores by Group", "4.10"):
        assert needed in text.replace("\n", " "), needed


def test_appending_keeps_everything(tmp_path):
    base = docx.Document()
    base.add_heading("Chapter 4", level=1)
    base.add_paragraph("An author's own paragraph.")
    t = base.add_table(rows=1, cols=2)
    t.cell(0, 0).text = "kept"
    original = tmp_path / "chapter.docx"
    base.save(str(original))
    before = docx.Document(str(original))
    assert "An author's own paragraph." in pdf_text(original)
    doc = results_document([EXAMPLES["pearson"]], base=original)
    out = save_document(doc, tmp_path / "chapter-results.docx", inputs=[original])
    after = docx.Document(str(out))
    old = [p.text for p in before.paragraphs]
    assert [p.text for p in after.paragraphs][: len(old)] == old
    assert after.tables[0].cell(0, 0).text == "kept"
    assert "r(98) = .32" in pdf_text(out)


def test_refuses_to_overwrite_input(tmp_path):
    from statsetter import InputError

    path = tmp_path / "in.docx"
    docx.Document().save(str(path))
    before = path.read_bytes()
    assert pdf_text(path) is not None
    with pytest.raises(InputError, match="overwrite an input"):
        save_document(results_document([EXAMPLES["pearson"]], base=path), path, inputs=[path])
    assert path.read_bytes() == before


def test_large_table_is_written_in_place(tmp_path):
    # a table's XML is written into the document part where its placeholder stands, on any save (ours or python-docx's)
    from statsetter.rendering.tables import Column, Row, TableModel, styled

    rows = tuple(Row(styled(f"row {i}"), (styled(f"{i / 100:.2f}"), styled("<i>x</i>"))) for i in range(400))
    big = TableModel(title=styled("Big"), columns=(Column(styled("A")), Column(styled("B"))), rows=rows,
                     stub_head=styled("Row"), general_note=styled("A note."))
    doc = results_document([EXAMPLES["pearson"]], title="Results", tables=[big])
    doc.add_paragraph("After the table.")
    path = save_document(doc, tmp_path / "big.docx")
    d = docx.Document(str(path))
    assert len(d.tables) == 1 and len(d.tables[0].rows) == 401
    assert d.tables[0].cell(400, 1).text == "3.99"
    texts = [p.text for p in d.paragraphs]
    assert texts[-2:] == ["Note. A note.", "After the table."]
    body = list(d.element.body)
    table_at = next(i for i, el in enumerate(body) if el.tag.endswith("}tbl"))
    assert body[table_at + 1].xpath("string(.)") == "Note. A note."
    assert "row 399" in pdf_text(path)
    doc.save(str(tmp_path / "again.docx"))  # python-docx's own save, a second time: the same table, once
    again = docx.Document(str(tmp_path / "again.docx"))
    assert len(again.tables) == 1 and again.tables[0].cell(400, 1).text == "3.99"
    assert b"statsetter-table" not in zipfile.ZipFile(tmp_path / "again.docx").read("word/document.xml")


def test_every_kind_of_row_is_written_alike(tmp_path):
    # rows of plain numbers are written from one list of pieces (the fast way); rows with a dash, a blank, an italic
    # cell, fewer cells or a padded text are written cell by cell: every cell must come out the same either way, and
    # text starting or ending with white space keeps it (xml:space="preserve", which is left off elsewhere)
    from lxml import etree

    from statsetter.rendering.tables import Column, Row, TableModel, styled

    bodies = [("1.25", "0.50"), ("—", "0.40"), ("", "0.30"), ("<i>x</i>", "0.20"), (), (" 7.00", "8.00 "), ("3.10", "0.10")]
    rows = tuple(Row(styled(f"row {i}"), tuple(styled(x) for x in b), indent=i % 2, heading=not b) for i, b in enumerate(bodies))
    t = TableModel(title=styled("Mixed"), columns=(Column(styled("A")), Column(styled("B"))), rows=rows, stub_head=styled("Row"))
    for padded in (True, False):
        table = t if padded else TableModel(title=t.title, columns=t.columns, rows=rows[:5] + rows[6:], stub_head=t.stub_head)
        path = save_document(results_document([], tables=[table]), tmp_path / f"mixed{padded}.docx")
        tbl = docx.Document(str(path)).tables[0]
        got = [[c.text for c in r.cells] for r in tbl.rows][1:]
        want = [["\u2003" * r.indent + r.stub.text] + ([c.text for c in r.cells] or [""]) for r in table.rows]
        assert [g[: len(w)] for g, w in zip(got, want)] == want
        xml = zipfile.ZipFile(path).read("word/document.xml").decode()
        texts = re.findall(r"<w:t( xml:space=\"preserve\")?>([^<]*)</w:t>", xml)
        assert all(kept for kept, text in texts if text[:1].isspace() or text[-1:].isspace())  # white space kept where it matters
        assert any(not kept for kept, _ in texts)  # and left off where it does not
        number_props: dict[int, set[bytes]] = {}  # per column, the paragraph properties of its number cells
        for r, row in zip(tbl._tbl.findall(f"{W}tr")[1:], table.rows):
            cells = r.findall(f"{W}tc")
            props = [c.find(f"{W}p/{W}pPr") for c in cells]
            assert props[0].find(f"{W}jc").get(qn("w:val")) == "left"
            assert all(p.find(f"{W}pStyle").get(qn("w:val")) == "StatsetterTableText" for p in props)
            for k, (cell, p) in enumerate(zip(row.cells, props[1:])):
                if cell.text.strip() in ("", "—"):
                    assert p.find(f"{W}jc").get(qn("w:val")) == "center"  # a dash or blank centred
                elif not cell.spans:
                    number_props.setdefault(k, set()).add(etree.tostring(p))
            last = row is table.rows[-1]
            assert all((c.find(f"{W}tcPr/{W}tcBorders/{W}bottom") is not None) == last for c in cells)
        assert all(len(v) == 1 for v in number_props.values()) and len(number_props) == 2  # the same for every number
        rendered = pdf_text(path)
        assert "3.10" in rendered and "1.25" in rendered and ("7.00" in rendered) == padded


def test_decimal_alignment_when_the_style_asks(tmp_path):
    # APA 7 §7.13 (memory): numbers may be centred or aligned on the decimal point
    house = tmp_path / "decimal.toml"
    house.write_text('extends = "apa7"\n[tables]\nnumber_align = "decimal"\n')
    path = save_document(results_document([], str(house), tables=[model()]), tmp_path / "dec.docx")
    xml = zipfile.ZipFile(path).read("word/document.xml").decode()
    assert xml.count('w:val="decimal"') == 4  # one tab stop per number cell
    (tmp_path / "centre.toml").write_text('extends = "apa7"\n[tables]\nnumber_align = "center"\n')
    centred = save_document(results_document([], str(tmp_path / "centre.toml"), tables=[model()]), tmp_path / "cen.docx")
    assert 'w:val="decimal"' not in zipfile.ZipFile(centred).read("word/document.xml").decode()
    assert "3.50" in pdf_text(centred)
    assert "3.50" in pdf_text(path)



def test_column_widths_keep_words_whole_when_rendered(tmp_path):
    # issue: stub labels broke inside words ("Predict/or", "asymptomati/c"); every Word table now has explicit, fixed
    # column widths within the text width. Checked as a reader sees it: LibreOffice -> PDF -> text, every word of
    # four letters or more of the stub and the cells whole. Data: the UCI heart-disease records pingouin ships.
    import pingouin as pg

    from statsetter.analyses import describe, linear_regression
    from statsetter.export.docx_writer import add_table, results_document, save_document
    from statsetter.rendering.regression_tables import regression_table

    heart = pg.read_dataset("chi2_independence").assign(
        cp=lambda f: f.cp.map({0: "typical angina", 1: "atypical angina", 2: "non-anginal pain", 3: "asymptomatic"}),
        sex=lambda f: f.sex.map({0: "female patients", 1: "male patients"}))
    labels = {"thalach": "Maximum heart rate (bpm)", "chol": "Serum cholesterol (mg/dl)", "cp": "Chest pain type", "age": "Age (years)"}
    tables = [table(describe(heart, ["age", "cp", "chol", "thalach"], group="sex", labels=labels, compare=True).main, "apa7"),
              regression_table(linear_regression(heart, "thalach", ["cp", "age", "sex"], labels=labels), "apa7")]
    document = results_document([], "apa7", title="Results")
    for t in tables:
        add_table(document, t, "apa7")
    path = tmp_path / "widths.docx"
    save_document(document, path)
    xml = zipfile.ZipFile(path).read("word/document.xml").decode()
    grids = re.findall(r"<w:tblGrid>(.*?)</w:tblGrid>", xml)
    assert len(grids) == 2 and '<w:tblLayout w:type="fixed"/>' in xml
    for grid in grids:
        widths = [int(w) for w in re.findall(r'w:w="(\d+)"', grid)]
        assert widths and sum(widths) <= 9360  # 6.5 inches: US Letter less 1-inch margins (APA 7 §2.22)
    text = " ".join(pdf_text(path).split())
    words = {w for t in tables for row in t.rows for cell in (row.stub, *row.cells)
             for w in re.findall(r"[A-Za-z][A-Za-z-]{3,}", cell.plain())}
    assert words and all(w in text for w in words), sorted(w for w in words if w not in text)


def test_a_table_caption_never_stands_alone_at_a_page_foot(tmp_path):
    # issue: the number and title could be stranded at the foot of a page while the table began on the next.
    # Checked as rendered: documents whose caption falls at every position near the first page's foot, converted by
    # LibreOffice; the page holding "Table 1" also holds the table's first stub (pdftotext, page by page).
    soffice = office()
    from statsetter.export.docx_writer import add_table, results_document, save_document
    from statsetter.rendering.record_tables import results_table

    table = results_table([EXAMPLES["t_independent"], EXAMPLES["chi2_independence"]], "apa7").with_number(1)
    first_stub = table.rows[0].stub.plain().split()[0]
    paths = []
    for filler in range(18, 30):  # (without keep-with-next, 21 to 25 strand the caption on page 1)
        document = results_document([], "apa7")
        for i in range(filler):
            document.add_paragraph(f"Filler paragraph {i + 1} of the results text.")
        add_table(document, table, "apa7")
        path = tmp_path / f"foot{filler}.docx"
        save_document(document, path)
        paths.append(path)
    subprocess.run([soffice, "--headless", "--convert-to", "pdf", "--outdir", str(tmp_path), *map(str, paths)],
                   check=True, capture_output=True, timeout=300, env={**os.environ, "HOME": str(tmp_path)})
    for path in paths:
        pages = subprocess.run(["pdftotext", str(path.with_suffix(".pdf")), "-"], check=True, capture_output=True, text=True).stdout.split("\f")
        holding = [k for k, page in enumerate(pages) if "Table 1" in page]
        assert len(holding) == 1 and first_stub in pages[holding[0]], (path.name, holding)


def broken(texts, shown, words=False):
    """The numbers (and with ``words`` the words of four letters or more) of ``texts`` that are not whole in the
    rendered text ``shown`` (pdftotext's, split into words): a number or word broken across lines by the renderer."""
    pattern = r"[A-Za-z]{4,}|\.?\d[\d,.]*\d|\d" if words else r"\.?\d[\d,.]*\d|\d"
    pieces = {n for t in texts for n in re.findall(pattern, t)}
    assert pieces, "nothing to look for"
    return sorted(n for n in pieces if not any(n in word for word in shown))


def _pdf_pages(path):
    """Each page of ``path`` converted by LibreOffice: (landscape?, text), from pdfinfo's page sizes and pdftotext."""
    pdf_text(path)
    pdf = path.with_suffix(".pdf")
    info = subprocess.run(["pdfinfo", "-f", "1", "-l", "999", str(pdf)], check=True, capture_output=True, text=True).stdout
    sizes = [(float(w), float(h)) for w, h in re.findall(r"Page\s+\d+ size:\s+([\d.]+) x ([\d.]+)", info)]
    texts = subprocess.run(["pdftotext", str(pdf), "-"], check=True, capture_output=True, text=True).stdout.split("\f")
    return [(w > h, text) for (w, h), text in zip(sizes, texts)]


def _species_by_island():
    """A Table 1 of pingouin's penguins by species × island: five groups, Total and p — wider than a portrait page."""
    import pingouin as pg

    from statsetter.analyses import describe

    d = pg.read_dataset("penguins")
    d["group"] = d.species + " " + d.island
    labels = {"bill_length_mm": "Bill length measured from the tip to the base of the skull (mm)", "flipper_length_mm": "Flipper (mm)"}
    return table(describe(d, ["bill_length_mm", "flipper_length_mm", "sex"], group="group", labels=labels, compare=True).main, "apa7")


def test_a_table_too_wide_for_the_page_is_set_on_landscape_pages(tmp_path):
    # issue: a Table 1 whose numbers alone need more than the portrait text width was shrunk to it, and LibreOffice
    # broke numbers inside themselves ("188.8" / "0"). Now such a table goes on landscape pages of its own (a course
    # guide to APA 7: a table's page may be turned "if doing so is helpful",
    # https://www.nathanwhudson.com/courses/apa-style/tables-figures/), with a warning; the text before and after keeps
    # its portrait pages and the page numbers run on. Checked as rendered: page sizes (pdfinfo) and text (pdftotext).
    wide = _species_by_island()
    narrow = table(EXAMPLES["t_independent"], "apa7")
    with pytest.warns(UserWarning, match=r"Table 1 is set on landscape pages: its columns need \d+\.\d in at the least and \d+\.\d in unwrapped; the page's text is 6\.5 in"):
        document = results_document([StyledText("Text before the wide table. " * 30), wide, StyledText("Text after the wide table. " * 30), narrow],
                                    "apa7", title="Results")
    path = save_document(document, tmp_path / "mixed.docx")
    pages = _pdf_pages(path)
    turned = [k for k, (landscape, _) in enumerate(pages) if landscape]
    assert turned and turned == list(range(turned[0], turned[-1] + 1))  # one run of landscape pages
    assert "Table 1" in pages[turned[0]][1] and "Table 1" not in "".join(t for _, t in pages[:turned[0]])
    assert "Text before" in pages[0][1] and not pages[0][0]
    after = next(k for k, (_, text) in enumerate(pages) if "Text after" in text)
    table2 = next(k for k, (_, text) in enumerate(pages) if "Table 2" in text)
    assert after > turned[-1] and not pages[after][0] and not pages[table2][0]
    assert [text.split()[0] for _, text in pages if text.strip()] == [str(k + 1) for k in range(len(pages))]  # APA's page number, top right
    shown = " ".join(t for _, t in pages[turned[0]:turned[-1] + 1]).split()
    assert broken([c.plain() for row in wide.rows for c in row.cells], shown) == []  # no number broken inside itself


def test_a_document_that_is_one_wide_table_is_one_landscape_page(tmp_path):
    # issue: a wide Table 1 written alone (statsetter describe --out table.docx) must not leave an empty page after it
    import warnings

    from statsetter.export.docx_writer import add_table

    document = docx.Document()
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        add_table(document, _species_by_island(), "apa7")
    pages = _pdf_pages(save_document(document, tmp_path / "alone.docx"))
    assert [landscape for landscape, _ in pages] == [True] and "Characteristics of the Sample" in pages[0][1]


def test_two_wide_tables_in_a_row_leave_no_empty_page_between(tmp_path):
    # found looking at every table kind in Word: two turned tables one after the other had an empty portrait page
    # between them (the first's landscape section ended, a portrait section of one empty paragraph, then the second's)
    import warnings

    wide = _species_by_island()
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        document = results_document([StyledText("Before."), wide, wide.with_number(2), StyledText("After.")], "apa7")
    pages = _pdf_pages(save_document(document, tmp_path / "two.docx"))
    assert all(text.split() != [str(k + 1)] for k, (_, text) in enumerate(pages))  # no page with only its number
    assert [landscape for landscape, _ in pages] == [False, True, True, False]


def test_a_long_stub_label_does_not_turn_the_page():
    # a questionnaire item as a variable's label is meant to wrap in the stub: its unwrapped width must not count
    # towards turning a table that fits (pingouin's penguins by species, three groups)
    import warnings

    from statsetter.analyses import describe

    import pingouin as pg

    item = "I felt tired during my shift even after a full night's sleep and a rest break, on most days of the week"
    t = table(describe(pg.read_dataset("penguins"), ["bill_length_mm", "sex"], group="species", labels={"bill_length_mm": item}).main, "apa7")
    with warnings.catch_warnings(record=True) as said:
        warnings.simplefilter("always")
        document = results_document([t], "apa7")
    assert [str(w.message) for w in said] == [] and 'w:orient="landscape"' not in document.element.xml


@pytest.mark.parametrize("style", ["apa7", "ama11"])
def test_a_range_of_numbers_is_not_broken_after_its_dash(tmp_path, style):
    # seen in LibreOffice: a Table 1 row of medians with their quartiles wrapped as "15.38 (12.09–" / "21.75)" — a line
    # is filled greedily and may break after a dash. Now a cell that wraps breaks its line before the range
    # ("15.38" / "(12.09–21.75)"), its column holds the range whole, and a cell that fits stays on one line. pingouin's
    # tips by day, every continuous variable with its median and quartiles; AMA's hyphen too.
    import pingouin as pg

    from statsetter.analyses import describe

    tips = pg.read_dataset("tips")
    t1 = table(describe(tips, ["total_bill", "tip"], group="day", show={"continuous": ["mean_sd", "median_iqr"]}, compare=True).main, style)
    document = results_document([StyledText("Text.")], style, title="Results", tables=[t1])
    pages = _pdf_pages(save_document(document, tmp_path / "ranges.docx"))
    lines = [line.strip() for _, text in pages for line in text.splitlines()]
    assert not [line for line in lines if re.search(r"\d[–-]$", line)], lines
    ranges = [c.plain().split(" ", 1)[1] for row in t1.rows for c in row.cells if re.search(r"\d[–-]\d", c.plain())]
    assert ranges and all(r in lines or any(r in line for line in lines) for r in ranges)  # each range whole on a line
    assert any(re.fullmatch(r"\d\.\d\d \(\d\.\d\d[–-]\d\.\d\d\)", c.plain()) and c.plain() in " ".join(lines)
               for row in t1.rows for c in row.cells)  # a short cell stays on one line
