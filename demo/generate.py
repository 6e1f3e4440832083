"""Generate the demo's INVENTED data and example records (seeded, reproducible).

Scenario (invented, no real people): a survey of 240 bus drivers at three
depots - shift pattern (early, late, rotating), hours slept, an 8-item
fatigue scale scored 1-5 - and a before/after subsample of 30 drivers in a
rest-break trial. Every number here comes from a random generator.

Until statsetter's own analyses land, the records are computed here directly
with numpy and scipy, so the demo shows real rendering of real (invented) data.
"""

from __future__ import annotations

import csv
import math
from pathlib import Path

import numpy as np
from scipy import stats

from statsetter import EffectSize, Estimate, GroupSummary, Interval, Note, Provenance, Result, Statistic, Variable
from statsetter import dump_records

HERE = Path(__file__).parent
SEED = 20261202
PROV = Provenance("demo/generate.py (invented data)", {"numpy": np.__version__})


def make_data(rng: np.random.Generator) -> dict[str, np.ndarray]:
    n = 240
    shift = rng.choice(["early", "late", "rotating"], size=n, p=[0.35, 0.35, 0.30])
    sleep = rng.normal(6.8, 0.9, n) - 0.5 * (shift == "rotating") - 0.2 * (shift == "late")
    fatigue = np.clip(4.4 - 0.35 * sleep + 0.3 * (shift == "rotating") + rng.normal(0, 0.55, n), 1, 5)
    incident = rng.random(n) < 1 / (1 + np.exp(-(-2.2 + 0.9 * (fatigue - 2.3))))
    return {"shift": shift, "sleep_hours": sleep.round(1), "fatigue": fatigue.round(2), "incident": incident}


def cohen_d_ci(d: float, n1: int, n2: int, level: float = 0.95) -> tuple[float, float]:
    """Normal-approximation CI of d (Hedges & Olkin, 1985, eq. for the SE of d)."""
    se = math.sqrt((n1 + n2) / (n1 * n2) + d * d / (2 * (n1 + n2)))
    z = stats.norm.ppf(0.5 + level / 2)
    return d - z * se, d + z * se


def records(data: dict[str, np.ndarray], rng: np.random.Generator) -> list[Result]:
    out: list[Result] = []
    fatigue, sleep, shift = data["fatigue"], data["sleep_hours"], data["shift"]
    out.append(
        Result(
            kind="descriptives_continuous",
            id="fatigue_overall",
            n=len(fatigue),
            groups=(GroupSummary("All drivers", n=len(fatigue), mean=float(fatigue.mean()), sd=float(fatigue.std(ddof=1)),
                                 median=float(np.median(fatigue))),),
            variables=(Variable("fatigue", "fatigue score", "variable", "interval"),),
            provenance=PROV,
        )
    )
    labels, counts = np.unique(shift, return_counts=True)
    out.append(
        Result(
            kind="descriptives_categorical",
            id="shift_counts",
            n=int(counts.sum()),
            groups=tuple(GroupSummary(f"{lab} shift", n=int(c), percent=100 * c / counts.sum()) for lab, c in zip(labels, counts)),
            variables=(Variable("shift", "shift pattern", "variable", "nominal"),),
            provenance=PROV,
        )
    )
    # Pearson r with a Fisher-z CI
    res = stats.pearsonr(sleep, fatigue)
    ci = res.confidence_interval(0.95)
    out.append(
        Result(
            kind="pearson",
            id="sleep_fatigue",
            statistic=Statistic("r", float(res.statistic), (len(sleep) - 2,)),
            p=float(res.pvalue),
            n=len(sleep),
            effects=(EffectSize("r", float(res.statistic), Interval(0.95, float(ci.low), float(ci.high)), method="Fisher z"),),
            variables=(Variable("sleep_hours", "hours slept", "x"), Variable("fatigue", "fatigue score", "y")),
            provenance=PROV,
        )
    )
    # Welch t: rotating vs early
    a, b = fatigue[shift == "rotating"], fatigue[shift == "early"]
    t = stats.ttest_ind(a, b, equal_var=False)
    tci = t.confidence_interval(0.95)
    sp = math.sqrt(((len(a) - 1) * a.var(ddof=1) + (len(b) - 1) * b.var(ddof=1)) / (len(a) + len(b) - 2))
    d = (a.mean() - b.mean()) / sp
    dlo, dhi = cohen_d_ci(d, len(a), len(b))
    out.append(
        Result(
            kind="t_independent",
            id="fatigue_by_shift",
            statistic=Statistic("t", float(t.statistic), (float(t.df),)),
            p=float(t.pvalue),
            n=len(a) + len(b),
            estimate=Estimate("mean difference", float(a.mean() - b.mean()), ci=Interval(0.95, float(tci.low), float(tci.high))),
            effects=(EffectSize("d", float(d), Interval(0.95, dlo, dhi), method="normal approximation"),),
            groups=(GroupSummary("rotating-shift drivers", n=len(a), mean=float(a.mean()), sd=float(a.std(ddof=1))),
                    GroupSummary("early-shift drivers", n=len(b), mean=float(b.mean()), sd=float(b.std(ddof=1)))),
            variables=(Variable("fatigue", "fatigue", "outcome"), Variable("shift", "shift pattern", "group")),
            details={"variant": "welch"},
            notes=(Note("choice", "Welch's t test (unequal variances not assumed equal)."),),
            provenance=PROV,
        )
    )
    # chi-square: shift x incident
    table = np.array([[np.sum((shift == s) & data["incident"]), np.sum((shift == s) & ~data["incident"])] for s in labels])
    chi = stats.chi2_contingency(table, correction=False)
    v = math.sqrt(chi.statistic / (table.sum() * (min(table.shape) - 1)))
    out.append(
        Result(
            kind="chi2_independence",
            id="incident_by_shift",
            statistic=Statistic("chi2", float(chi.statistic), (int(chi.dof),)),
            p=float(chi.pvalue),
            n=int(table.sum()),
            effects=(EffectSize("V", v),),
            variables=(Variable("shift", "shift pattern", "row"), Variable("incident", "a reported incident", "column")),
            provenance=PROV,
        )
    )
    # one-way ANOVA of sleep across shifts
    groups = [sleep[shift == s] for s in labels]
    f = stats.f_oneway(*groups)
    grand = sleep.mean()
    ss_b = sum(len(g) * (g.mean() - grand) ** 2 for g in groups)
    ss_t = ((sleep - grand) ** 2).sum()
    df_b, df_w = len(groups) - 1, len(sleep) - len(groups)
    ms_w = (ss_t - ss_b) / df_w
    out.append(
        Result(
            kind="anova_oneway",
            id="sleep_by_shift",
            statistic=Statistic("F", float(f.statistic), (df_b, df_w)),
            p=float(f.pvalue),
            n=len(sleep),
            effects=(EffectSize("eta2", ss_b / ss_t), EffectSize("omega2", (ss_b - df_b * ms_w) / (ss_t + ms_w))),
            groups=tuple(GroupSummary(f"{s} shift", n=len(g), mean=float(g.mean()), sd=float(g.std(ddof=1))) for s, g in zip(labels, groups)),
            variables=(Variable("sleep_hours", "hours slept", "outcome"), Variable("shift", "shift pattern", "group")),
            details={"variant": "classic"},
            provenance=PROV,
        )
    )
    # paired t: rest-break trial subsample
    before = rng.normal(3.3, 0.6, 30)
    after = before - rng.normal(0.25, 0.45, 30)
    pt = stats.ttest_rel(before, after)
    pci = pt.confidence_interval(0.95)
    diff = before - after
    dz = diff.mean() / diff.std(ddof=1)
    out.append(
        Result(
            kind="t_paired",
            id="rest_break_trial",
            statistic=Statistic("t", float(pt.statistic), (int(pt.df),)),
            p=float(pt.pvalue),
            n=30,
            estimate=Estimate("mean difference", float(diff.mean()), ci=Interval(0.95, float(pci.low), float(pci.high))),
            effects=(EffectSize("d_z", float(dz)),),
            groups=(GroupSummary("baseline", n=30, mean=float(before.mean()), sd=float(before.std(ddof=1))),
                    GroupSummary("follow-up", n=30, mean=float(after.mean()), sd=float(after.std(ddof=1)))),
            variables=(Variable("fatigue", "fatigue", "outcome"),),
            provenance=PROV,
        )
    )
    # Mann-Whitney: sleep, late vs early
    la, ea = sleep[shift == "late"], sleep[shift == "early"]
    mw = stats.mannwhitneyu(la, ea, alternative="two-sided", method="asymptotic")
    rrb = 2 * mw.statistic / (len(la) * len(ea)) - 1
    out.append(
        Result(
            kind="mann_whitney",
            id="sleep_late_early",
            statistic=Statistic("U", float(mw.statistic)),
            p=float(mw.pvalue),
            n=len(la) + len(ea),
            effects=(EffectSize("r_rb", float(rrb)),),
            groups=(GroupSummary("late-shift drivers", n=len(la), median=float(np.median(la))),
                    GroupSummary("early-shift drivers", n=len(ea), median=float(np.median(ea)))),
            variables=(Variable("sleep_hours", "hours slept", "outcome"),),
            details={"method": "normal approximation"},
            provenance=PROV,
        )
    )
    return out


def main() -> Path:
    rng = np.random.default_rng(SEED)
    data = make_data(rng)
    (HERE / "data").mkdir(exist_ok=True)
    path = HERE / "data" / "invented_driver_survey.csv"
    with path.open("w", newline="", encoding="utf-8") as fh:
        fh.write("# INVENTED DATA for the statsetter demo, generated by demo/generate.py (seeded); no real people.\n")
        w = csv.writer(fh)
        w.writerow(list(data))
        for row in zip(*data.values()):
            w.writerow(row)
    recs = records(data, rng)
    out = HERE / "data" / "invented_records.json"
    out.write_text(dump_records(recs) + "\n", encoding="utf-8")
    return out


if __name__ == "__main__":
    print(main())
