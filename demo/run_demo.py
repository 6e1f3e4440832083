"""The demo: INVENTED records rendered in three styles, to the terminal and Markdown."""

from __future__ import annotations

import sys
from pathlib import Path

HERE = Path(__file__).parent
sys.path.insert(0, str(HERE))

import generate  # noqa: E402

from statsetter import load_records, load_style, render  # noqa: E402
from statsetter.export.docx_writer import results_document, save_document  # noqa: E402
from statsetter.export.markers import describe, fill_chapter  # noqa: E402
from statsetter.files import write_atomic  # noqa: E402

CAUTION = (
    "Invented data. Check every reported result against your journal's instructions, your "
    "institution's thesis rules and your ethics approval, and with a qualified statistician."
)


def main() -> None:
    path = generate.main()
    records = load_records(path.read_text(encoding="utf-8"), source=str(path))
    styles = [load_style("apa7"), load_style("ama11"), load_style(HERE / "house-comma.toml")]
    out_dir = HERE / "out"
    out_dir.mkdir(exist_ok=True)
    md = ["# statsetter demo: results from an invented driver survey", "", f"*{CAUTION}*", ""]
    for style in styles:
        print(f"\n== {style.title}")
        md += [f"## {style.title}", ""]
        for r in records:
            sentence = render(r, "sentence", style)
            print(f"[{r.id}] {sentence.plain()}")
            md += [f"**{r.id}**: {sentence.markdown()}", "", f"Statistics string: {render(r, 'stats', style).markdown()}", ""]
    target = write_atomic(out_dir / "results.md", "\n".join(md) + "\n")
    docx_path = save_document(results_document(records, styles[0], title="Results (invented data)"), out_dir / "results.docx")
    chapter = make_chapter(out_dir / "chapter-with-markers.docx")
    report = fill_chapter(chapter, records, out_dir / "chapter-filled.docx", styles[0])
    print(f"\n{CAUTION}")
    print(f"Records:         {path}")
    print(f"Markdown:        {target}")
    print(f"Word results:    {docx_path}")
    print(f"Chapter markers: {chapter}")
    print(f"Filled chapter:  {out_dir / 'chapter-filled.docx'} ({'; '.join(describe(report))})")


def make_chapter(path: Path) -> Path:
    """An author's chapter (invented) with result markers of our syntax."""
    import docx

    d = docx.Document()
    d.add_heading("Chapter 4: Results (invented data)", level=1)
    d.add_paragraph("Drivers on rotating shifts reported more fatigue: [[fatigue_by_shift]].")
    d.add_paragraph("[[sleep_fatigue|sentence]]")
    d.add_paragraph("The rest-break subsample: [[rest_break_trial]].")
    d.save(str(path))
    return path


if __name__ == "__main__":
    main()
