"""The demo runs end to end and says its data are invented (common practice: a demo smoke test)."""

import re
import subprocess
import sys
from pathlib import Path

import docx

ROOT = Path(__file__).resolve().parents[1]


def test_demo_runs():
    proc = subprocess.run([sys.executable, str(ROOT / "demo" / "run_demo.py")], capture_output=True, text=True, check=True)
    assert "Invented data" in proc.stdout
    out = ROOT / "demo" / "out"
    for name in ("results.md", "results.docx", "chapter-filled.docx"):
        assert (out / name).exists(), name
    filled = "\n".join(p.text for p in docx.Document(str(out / "chapter-filled.docx")).paragraphs)
    assert "[[" not in filled and re.search(r"t\(\d+\.\d+\) = \d", filled)
    from test_docx import pdf_text

    for name in ("results.docx", "chapter-with-markers.docx", "chapter-filled.docx"):
        assert pdf_text(out / name).strip()  # LibreOffice opens every .docx the demo writes
    assert (ROOT / "demo" / "data" / "invented_driver_survey.csv").read_text().startswith("# INVENTED DATA")
