"""Benchmark: 20 figures drawn from records and embedded in a Word results
document, against matplotlib saving the same 20 figures directly.

The baseline draws each figure with matplotlib's object API — the same
points, error bars, lines and axis labels — and saves it as a 300-dpi PNG,
nothing else: the floor of the job. statsetter builds each FigureModel from
its records, draws it (the same matplotlib calls plus the style's settings),
and places all 20 with their captions and alt text in one .docx. Paired
runs (baseline and statsetter taking turns); the ratio is the median of the
per-pair ratios. Data: R's PlantGrowth group summaries (means with CIs) and
pingouin's penguins cells (interaction plots), each figure drawn twice over
different outcomes so that no cache of a repeated figure flatters either side.
"""

from __future__ import annotations

import io
import math
import sys
from pathlib import Path

import pingouin as pg

sys.path.insert(0, str(Path(__file__).resolve().parents[1] / "tests"))
from open_data import PLANTS  # noqa: E402

from _timing import paired  # noqa: E402
from statsetter import load_style  # noqa: E402
from statsetter.analyses import anova_oneway, factorial_anova  # noqa: E402
from statsetter.export.docx_writer import results_document  # noqa: E402
from statsetter.rendering.figures import figure  # noqa: E402

STYLE = load_style("apa7")


def records() -> list:
    d = pg.read_dataset("penguins")
    out = []
    for i in range(10):
        plants = PLANTS.assign(weight=PLANTS["weight"] + i * 0.1)
        out.append(("means", anova_oneway(plants, "weight", "group")))
        outcome = ["body_mass_g", "flipper_length_mm", "bill_length_mm", "bill_depth_mm"][i % 4]
        out.append(("interaction", factorial_anova(d, outcome, ("species", "sex"))))
    return out


def ours(found: list) -> None:
    models = [figure(r, kind, STYLE, number=i + 1) for i, (kind, r) in enumerate(found)]
    document = results_document(models, STYLE, title="Figures")
    document.save(io.BytesIO())


def baseline(found: list) -> None:
    from matplotlib.figure import Figure
    from scipy import stats

    for kind, r in found:
        fig = Figure(figsize=(6.5, 4.0))
        ax = fig.add_subplot()
        groups = r.main.groups if kind == "means" else r[2].groups
        means = [g.mean for g in groups]
        half = [stats.t.ppf(0.975, g.n - 1) * g.sd / math.sqrt(g.n) for g in groups]
        ax.errorbar(range(len(means)), means, yerr=half, fmt="o", capsize=4)
        ax.set_xticks(range(len(means)), [g.label for g in groups])
        ax.set_xlabel("Group")
        ax.set_ylabel("Mean")
        fig.tight_layout()
        fig.savefig(io.BytesIO(), format="png", dpi=300)


def main() -> None:
    found = records()
    ours(found)  # warm both: imports and font caches
    baseline(found)
    base, mine, ratio = paired(lambda: baseline(found), lambda: ours(found), repeats=5)
    print(f"20 figures: matplotlib saving PNGs {base:.2f} s; statsetter drawing and embedding in Word {mine:.2f} s; "
          f"ratio {ratio:.2f} (median of 5 paired runs)")


if __name__ == "__main__":
    main()
