"""The built wheel carries the templates and renders from a fresh venv."""

import subprocess
import sys
import venv
import zipfile
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parents[1]


@pytest.mark.slow
def test_wheel_contains_templates_and_renders(tmp_path):
    dist = tmp_path / "dist"
    subprocess.run([sys.executable, "-m", "build", "--wheel", "--outdir", str(dist), str(ROOT)], check=True, capture_output=True)
    wheel = next(dist.glob("statsetter-*.whl"))
    names = zipfile.ZipFile(wheel).namelist()
    assert "statsetter/templates/en/t_independent.j2" in names
    assert "statsetter/style/profiles/apa7.toml" in names
    env = tmp_path / "venv"
    venv.create(env, with_pip=True)
    py = env / "bin" / "python"
    subprocess.run([str(py), "-m", "pip", "install", "-q", str(wheel)], check=True, capture_output=True)
    out = subprocess.run(
        [str(env / "bin" / "statsetter"), "format", "r", "--stat", "0.32", "--df", "98", "--p", "0.0012"],
        check=True, capture_output=True, text=True, cwd=tmp_path,
    )
    assert out.stdout == "r(98) = .32, p = .001\n"
    where = subprocess.run([str(py), "-c", "import statsetter.rendering.sentences as s; print(s.templates_dir())"],
                           check=True, capture_output=True, text=True, cwd=tmp_path)
    assert str(env) in where.stdout  # templates come from the installed package, not the source tree
