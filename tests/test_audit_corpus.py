"""The audit measured on an invented manuscript with planted errors (tests/audit_corpus.py),
in Markdown and in Word: recall of planted errors, precision of findings, share parsed.
Targets (the audit issue): recall >= 95%, precision >= 95%, parsed >= 98%."""

from __future__ import annotations

import audit_corpus
from statsetter.audit.report import audit_file


def measure(paragraphs, entries, word: bool):
    by_text = {}
    for e in entries:
        by_text.setdefault(e.unit.text, []).append(e)
    planted = found_planted = findings = true_findings = statistics = parsed = 0
    misses, noise = [], []
    for text, spans in paragraphs:
        mine = by_text.get(text, [])
        used = set()
        for start, end, item in spans:
            statistics += 1
            hits = [e for e in mine if e.start < end and e.end > start]
            if hits:
                parsed += 1
            expected = set(item.codes) if (word or not item.docx_only) else set()
            got = {c for e in hits for c in e.codes}
            used |= {id(e) for e in hits}
            planted += len(expected)
            found_planted += len(expected & got)
            findings += len(got)
            true_findings += len(expected & got)
            if expected - got:
                misses.append((item.text, sorted(expected - got), sorted(got)))
            if got - expected:
                noise.append((item.text, sorted(got - expected)))
        for e in mine:
            if id(e) not in used and e.codes:
                findings += len(e.codes)
                noise.append((e.found, e.codes))
    return {"recall": found_planted / planted, "precision": true_findings / findings, "parsed": parsed / statistics,
            "statistics": statistics, "planted": planted, "misses": misses, "noise": noise}


def test_corpus_recall_precision_parsed(tmp_path):
    paragraphs = audit_corpus.build()
    md, word = tmp_path / "corpus.md", tmp_path / "corpus.docx"
    audit_corpus.write_md(paragraphs, md)
    audit_corpus.write_docx(paragraphs, word)
    for path, is_word in ((md, False), (word, True)):
        figures = measure(paragraphs, audit_file(path, grim_items=1), is_word)
        print(f"{path.suffix}: {figures['statistics']} statistics, {figures['planted']} planted errors; recall {figures['recall']:.1%}, "
              f"precision {figures['precision']:.1%}, parsed {figures['parsed']:.1%}")
        assert figures["parsed"] >= 0.98, figures["misses"][:5]
        assert figures["recall"] >= 0.95, figures["misses"][:10]
        assert figures["precision"] >= 0.95, figures["noise"][:10]
