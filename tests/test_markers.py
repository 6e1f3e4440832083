"""Markers in an author's chapter: split runs, table cells, headers, footers,
footnotes; unknown markers and unused records reported; input never overwritten;
bad .docx input gets a clear error. Outputs are read back through LibreOffice."""

import dataclasses
import io
import zipfile

import docx
import pytest

from kind_examples import EXAMPLES
from statsetter import InputError, dump_records
from statsetter.cli import main
from statsetter.export.docx_input import open_docx
from statsetter.export.markers import fill_chapter
from test_docx import pdf_text

RECORDS = [
    dataclasses.replace(EXAMPLES["t_independent"], id="score_diff"),
    dataclasses.replace(EXAMPLES["pearson"], id="corr"),
    dataclasses.replace(EXAMPLES["anova_oneway"], id="spare"),
]

FOOTNOTES = (
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
    '<w:footnotes xmlns:w="http://schemas.openxmlformats.org/wordprocessingml/2006/main">'
    '<w:footnote w:id="1"><w:p><w:r><w:t xml:space="preserve">See [[corr]].</w:t></w:r></w:p></w:footnote>'
    "</w:footnotes>"
)


def add_footnotes(path):
    """Add a footnotes part to a python-docx file (python-docx cannot write one)."""
    buf = io.BytesIO()
    with zipfile.ZipFile(path) as zin, zipfile.ZipFile(buf, "w", zipfile.ZIP_DEFLATED) as zout:
        for item in zin.infolist():
            data = zin.read(item.filename)
            if item.filename == "[Content_Types].xml":
                data = data.replace(
                    b"</Types>",
                    b'<Override PartName="/word/footnotes.xml" ContentType="application/vnd.openxmlformats-officedocument.wordprocessingml.footnotes+xml"/></Types>',
                )
            if item.filename == "word/_rels/document.xml.rels":
                data = data.replace(
                    b"</Relationships>",
                    b'<Relationship Id="rIdFn1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/footnotes" Target="footnotes.xml"/></Relationships>',
                )
            zout.writestr(item, data)
        zout.writestr("word/footnotes.xml", FOOTNOTES)
    path.write_bytes(buf.getvalue())


@pytest.fixture
def chapter(tmp_path):
    d = docx.Document()
    p = d.add_paragraph("Scores differed ")
    r = p.add_run("[[score_")
    r.bold = True
    p.add_run("diff|sentence]] as expected; see [[corr]].")
    d.add_paragraph("Unknown [[nope]] stays.")
    d.add_table(rows=1, cols=1).cell(0, 0).text = "[[corr]]"
    d.add_paragraph("Table 2 shows it: [[score_diff|table]]")
    d.sections[0].header.paragraphs[0].text = "Header [[corr]]"
    d.sections[0].footer.paragraphs[0].text = "Footer [[corr|stats]]"
    path = tmp_path / "chapter.docx"
    d.save(str(path))
    add_footnotes(path)
    return path


def test_fill_everywhere(chapter, tmp_path):
    assert "[[corr]]" in pdf_text(chapter)  # the chapter the test wrote opens in LibreOffice
    before = chapter.read_bytes()
    out = tmp_path / "filled.docx"
    report = fill_chapter(chapter, RECORDS, out)
    assert chapter.read_bytes() == before  # the input is never modified
    assert len(report.filled) == 7
    assert report.unknown == [("[[nope]]", "body paragraph 2")]
    assert report.unused == ["spare"]
    d = docx.Document(str(out))
    first = d.paragraphs[0]
    assert first.text.startswith("Scores differed The score was higher")
    assert first.text.replace("\u00a0", " ").endswith("as expected; see r(98) = .32, 95% CI [.13, .49], p = .001.")
    assert first.runs[0].text == "Scores differed " and not first.runs[0].bold  # surrounding formatting kept
    assert [r.text for r in first.runs if r.italic][:3] == ["M", "SD", "n"]
    assert d.tables[0].cell(0, 0).text.replace("\u00a0", " ") == "r(98) = .32, 95% CI [.13, .49], p = .001"
    # [[id|table]]: a results table after the paragraph, the marker text gone
    # ... with its number (first table placed: Table 1) and a title, flush left and kept with the table
    assert [p.text for p in d.paragraphs[2:5]] == ["Table 2 shows it: ", "Table 1", "The Score by Group"]
    assert d.paragraphs[3].runs[0].bold and d.paragraphs[3].paragraph_format.keep_with_next and d.paragraphs[4].runs[0].italic
    t = d.tables[1]
    cells = [c.text.replace("\u00a0", " ").strip() for c in t.rows[1].cells]  # .strip(): a tab before a decimal-aligned number
    assert cells == ["The score by group", "t(38) = 2.14", ".039", "d = 0.68", "[0.04, 1.31]"]  # the p symbol is in the head (practice: a column head names its quantity)
    assert "r(98)\u00a0=\u00a0.32" in d.sections[0].header.paragraphs[0].text
    assert "r(98)\u00a0=\u00a0.32" in d.sections[0].footer.paragraphs[0].text
    footnotes = zipfile.ZipFile(out).read("word/footnotes.xml").decode()
    assert "[[corr]]" not in footnotes and "=\u00a0.32" in footnotes
    text = pdf_text(out)
    assert "t(38) = 2.14" in text.replace("\n", " ") and "Unknown [[nope]] stays." in text


def test_refuses_same_path(chapter):
    with pytest.raises(InputError, match="overwrite the chapter"):
        fill_chapter(chapter, RECORDS, chapter)


def test_cli_fill(chapter, tmp_path, capsys):
    recs = tmp_path / "records.json"
    recs.write_text(dump_records(RECORDS))
    out = tmp_path / "cli.docx"
    code = main(["fill", str(chapter), "--records", str(recs), "--out", str(out)])
    captured = capsys.readouterr()
    assert code == 1  # an unknown marker is a finding
    assert "unknown marker [[nope]]" in captured.out and "not placed by any marker: spare" in captured.out
    assert out.exists()
    assert "r(98) = .32" in pdf_text(out)


def test_a_marker_of_another_form_is_said_not_passed_over(tmp_path, capsys):
    """"[[corr|bogus]]" (a form the syntax has not), "[[two words]]" and "[[score_diff | Sentence]]" look like markers
    but are none: each is said as unknown, with the forms after '|' where one was given, and the run ends with exit 1
    (they had been passed over in silence, left in the chapter). "[[corr]]" beside them is filled."""
    d = docx.Document()
    d.add_paragraph("See [[corr|bogus]], [[two words]], [[score_diff | Sentence]] and [[corr]].")
    chapter = tmp_path / "c.docx"
    d.save(str(chapter))
    recs = tmp_path / "records.json"
    recs.write_text(dump_records(RECORDS))
    code = main(["fill", str(chapter), "--records", str(recs), "--out", str(tmp_path / "out.docx")])
    said = capsys.readouterr().out
    assert code == 1 and "filled 1 marker(s)" in said
    assert "unknown marker [[corr|bogus]] in body paragraph 1 (left as it is; after '|' a marker takes stats, sentence or table, not 'bogus')" in said
    assert "unknown marker [[two words]] in body paragraph 1 (left as it is)" in said
    assert "not 'Sentence'" in said


@pytest.mark.parametrize(
    "content, message",
    [
        (b"", "empty"),
        (b"plain text, not a document", "not a zip"),
        (b"\xd0\xcf\x11\xe0\xa1\xb1\x1a\xe1" + b"\0" * 100, "password-protected"),
    ],
)
def test_bad_docx(tmp_path, content, message):
    bad = tmp_path / "bad.docx"
    bad.write_bytes(content)
    with pytest.raises(InputError, match=message):
        open_docx(bad)


def test_zip_that_is_not_word_and_zip_bomb(tmp_path):
    z = tmp_path / "z.docx"
    with zipfile.ZipFile(z, "w") as f:
        f.writestr("hello.txt", "hi")
    with pytest.raises(InputError, match="not a Word document"):
        open_docx(z)
    bomb = tmp_path / "bomb.docx"
    with zipfile.ZipFile(bomb, "w", zipfile.ZIP_DEFLATED) as f:
        f.writestr("[Content_Types].xml", "<Types/>")
        f.writestr("word/document.xml", "<w:document/>")
        f.writestr("word/media/big.bin", b"\0" * (8 << 20))  # 8 MiB of zeros packs to a few KiB
    with pytest.raises(InputError, match="zip bomb"):
        open_docx(bomb)
    big = tmp_path / "big.docx"
    with zipfile.ZipFile(big, "w", zipfile.ZIP_STORED) as f:
        f.writestr("[Content_Types].xml", "<Types/>")
        f.writestr("word/document.xml", "x" * 5000)
    with pytest.raises(InputError, match="over the limit"):
        open_docx(big, max_unpacked=1000)


def test_a_wide_table_placed_in_a_chapter_turns_only_its_own_pages(tmp_path):
    # issue: a wide table filled into an author's chapter was shrunk to the portrait text and its numbers broke inside
    # themselves. Now it goes on landscape pages of its own between the chapter's portrait pages; the chapter's first
    # page keeps its different first-page header; a copy in a table cell (which cannot turn) is shrunk with a warning.
    from test_docx import _pdf_pages, _species_by_island

    d = docx.Document()
    d.sections[0].different_first_page_header_footer = True
    d.sections[0].first_page_header.paragraphs[0].text = "FIRST PAGE HEADER"
    d.sections[0].header.paragraphs[0].text = "RUNNING HEAD"
    d.add_paragraph("Opening text of the chapter. " * 40)
    d.add_paragraph("[[table:wide]]")
    d.add_paragraph("Closing text of the chapter. " * 40)
    d.add_table(rows=1, cols=1).cell(0, 0).text = "[[table:wide]]"
    d.add_paragraph("The last words.")
    chapter = tmp_path / "chapter.docx"
    d.save(str(chapter))
    out = tmp_path / "filled.docx"
    with pytest.warns(UserWarning) as caught:
        fill_chapter(chapter, [], out, "apa7", tables={"wide": _species_by_island()})
    said = [str(w.message) for w in caught]
    assert any("is set on landscape pages" in m for m in said) and any("wrap inside a word" in m for m in said), said
    pages = _pdf_pages(out)
    kinds = [landscape for landscape, _ in pages]
    first_turned = kinds.index(True)
    assert "Opening text" in pages[0][1] and "FIRST PAGE HEADER" in pages[0][1] and not kinds[0]
    assert "Characteristics of the Sample" in pages[first_turned][1] and "Opening text" not in pages[first_turned][1]
    after = [k for k, (_, text) in enumerate(pages) if "Closing text" in text]
    assert after and all(not kinds[k] and k > first_turned for k in after)
    assert all("FIRST PAGE HEADER" not in text for _, text in pages[1:])  # only the chapter's first page has that header
    assert all("RUNNING HEAD" in text for _, text in pages[1:])
    assert kinds.count(True) == 1 and not kinds[-1]  # the copy in the table cell stays on the portrait pages


def test_wide_tables_in_consecutive_marker_paragraphs_leave_no_empty_page(tmp_path):
    # found rendering a chapter: two wide tables whose markers stood in consecutive paragraphs had an empty portrait
    # page between them (each marker paragraph went to its table, and the portrait section between them held
    # nothing); now the empty section is removed as the document is saved: portrait, landscape, landscape, portrait
    import warnings

    from test_docx import _pdf_pages, _species_by_island

    d = docx.Document()
    d.add_paragraph("The sample is described first.")
    d.add_paragraph("[[table:one]]")
    d.add_paragraph("[[table:two]]")
    d.add_paragraph("After both tables the text goes on.")
    chapter = tmp_path / "chapter.docx"
    d.save(str(chapter))
    wide = _species_by_island()
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        fill_chapter(chapter, [], tmp_path / "filled.docx", "apa7", tables={"one": wide, "two": wide})
    pages = _pdf_pages(tmp_path / "filled.docx")
    assert [landscape for landscape, _ in pages] == [False, True, True, False], [t[:60] for _, t in pages]
    assert "Table 1" in pages[1][1] and "Table 2" in pages[2][1] and "After both tables" in pages[3][1]


@pytest.mark.parametrize("width", ["abc", "", "1e9", "8.5in"])
def test_a_page_size_that_is_not_a_number_of_twips_does_not_stop_a_fill(tmp_path, width):
    # found by a fuzz of chapters with hostile section properties: python-docx's page_width raised ValueError on
    # w:pgSz w="abc" and the fill ended in an internal error; a measure with a unit ("8.5in") is OOXML's own
    from docx.oxml.ns import qn

    d = docx.Document()
    d.add_paragraph("[[score_diff|table]]")
    d.sections[0]._sectPr.find(qn("w:pgSz")).set(qn("w:w"), width)
    chapter = tmp_path / "chapter.docx"
    d.save(str(chapter))
    report = fill_chapter(chapter, RECORDS, tmp_path / "filled.docx")
    assert [key for key, _ in report.filled] == ["score_diff"]
    assert len(docx.Document(str(tmp_path / "filled.docx")).tables) == 1
