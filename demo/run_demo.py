"""The demo, on INVENTED data: generate the data, run the plan (every analysis,
a descriptives table by group, a correlation table, a results table), write
Word, Markdown, HTML, LaTeX and JSON, fill an author's chapter, re-render the
records in two more styles as a co-author would, and audit a manuscript
excerpt with planted errors."""

from __future__ import annotations

import sys
from pathlib import Path

HERE = Path(__file__).parent
sys.path.insert(0, str(HERE))

import generate  # noqa: E402

from statsetter import load_style, render  # noqa: E402
from statsetter.audit.report import as_json, audit_file, print_table  # noqa: E402
from statsetter.files import write_atomic  # noqa: E402
from statsetter.plan import load_plan, run_plan, write_outputs  # noqa: E402

CAUTION = (
    "Invented data. Check every reported result against your journal's instructions, your "
    "institution's thesis rules and your ethics approval, and with a qualified statistician."
)


def main(plan_path: Path = HERE / "plan.toml") -> int:
    data = generate.main(plan_path.parent / "data")
    out = plan_path.parent / "out"
    out.mkdir(exist_ok=True)
    generate.make_chapter(out / "chapter-with-markers.docx")
    plan = load_plan(plan_path)
    result = write_outputs(plan, run_plan(plan))
    print(f"{CAUTION}\n")
    print(f"Data (invented): {data}")
    print(f"{len(result.records)} results from {len(plan.analyses)} analyses; {len(result.tables)} tables")
    picks = [r for r in result.records if r.id in ("fatigue_alpha", "fatigue_by_incident", "fatigue_by_shift", "shift_incident")]
    styles = (load_style("apa7"), load_style("ama11"), load_style(HERE / "house-comma.toml"))
    print("\n== The same results in " + "; ".join(s.title for s in styles))
    width = max(len(s.name) for s in styles)
    for r in picks:  # each result in each style, one under the other
        print(f"[{r.id}]")
        for style in styles:
            print(f"  {style.name:{width}}  {render(r, 'stats', style).plain()}")
    sentence = next(r for r in result.records if r.id == "fatigue_by_incident")
    for style in styles[:2]:
        print(f"  {style.name:{width}}  {render(sentence, 'sentence', style).plain()}")
    print("\n== Audit of demo/manuscript-excerpt.md (planted errors)")
    entries = audit_file(HERE / "manuscript-excerpt.md")
    print_table(entries)
    report = write_atomic(out / "audit-report.json", as_json(entries) + "\n")
    print("\nOutputs:")
    for what, path in result.written:
        print(f"  {what:8} {path}")
    print(f"  {'audit':8} {report} (every statistic of demo/manuscript-excerpt.md, with its findings)")
    for note in result.notes:
        if not note.endswith("not used by any marker"):
            print(f"  {note}")
    return 0


if __name__ == "__main__":
    raise SystemExit(main())
