"""A ratio (OR, HR, RR) against its own interval: the ratio at the interval's centre on the log scale, and its p the one the
interval gives (Altman & Bland, 2011, BMJ 343:d2090, "How to obtain the P value from a confidence interval"), on published
tables and sentences (each cited) and on registry data; and the typings of an interval's limits this needs ("1.277~1.384",
"1.043−3.013")."""

from __future__ import annotations

import math

import numpy as np
from scipy import stats
from scipy.stats.contingency import odds_ratio

from statsetter.audit.report import audit_file


def _table(caption: str, heads: list[str], rows: list[list[str]], note: str = "") -> str:
    lines = [caption, "", "| " + " | ".join(heads) + " |", "|" + "---|" * len(heads)]
    return "\n".join(lines + ["| " + " | ".join(r) + " |" for r in rows]) + "\n" + (f"\n{note}\n" if note else "")


def _audit(tmp_path, text: str, name: str = "t.md"):  # type: ignore[no-untyped-def]
    path = tmp_path / name
    path.write_text(text, encoding="utf-8")
    return audit_file(path)


# PMC7940880 (a Korean national cohort of SARS-CoV-2 tests), Table 3, "Association between potential risk factors and
# SARS-CoV-2 infection": multivariate logistic odds ratios with their 95% CIs and P values, as published
_PMC7940880 = [["Female", "1.30 (1.24–1.37)", "<0.0001"], ["Age >65 years", "1.01 (0.93–1.09)", "0.8676"],
               ["Daegu and Gyeonsangbuk-do province", "6.87 (6.55–7.21)", "<0.0001"], ["Medical Aid beneficiaries", "1.99 (1.82–2.18)", "<0.0001"],
               ["1", "0.79 (0.74–0.84)", "<0.0001"], ["2", "0.70 (0.65–0.76)", "<0.0001"], ["≥3", "0.61 (0.56–0.67)", "<0.0001"],
               ["Essential hypertension", "0.98 (0.92–1.05)", "0.6005"], ["DM", "1.15 (1.01–1.24)", "0.0002"],
               ["Asthma", "0.86 (0.81–0.92)", "<0.0001"], ["COPD", "0.56 (0.49–0.65)", "<0.0001"], ["IHD", "0.77 (0.70–0.85)", "<0.0001"],
               ["CHF", "0.72 (0.63–0.81)", "<0.0001"], ["Cancer", "0.60 (0.53–0.67)", "<0.0001"], ["Liver cirrhosis", "0.53 (0.43–0.65)", "<0.0001"],
               ["ESRD with dialysis", "0.18 (0.11–0.29)", "<0.0001"], ["IBD", "0.51 (0.33–0.80)", "0.0028"]]

# J Geriatr Cardiol 2021;18(1):75–82 (PMC7868910), Table 3, "Crude odds ratios (CORs) and adjusted odds ratios (AORs) of
# rick factors associated with hypertension": rows as published, the limits set off by a minus sign (U+2212) as the page
# prints them, the marks' note as published ("***P < 0.01, ** < 0.05, * < 0.1": a list whose later marks leave the P out)
_PMC7868910 = [["55−59", "1.773", "1.043−3.013", "**", "1.535", "0.803−2.936", ""], ["60−64", "1.902", "1.112−3.253", "**", "1.223", "0.598−2.501", ""],
               ["65−69", "2.821", "1.541−3.253", "***", "2.298", "1.051−5.020", "**"], ["70−74", "1.577", "0.846−2.937", "", "0.659", "0.270−1.608", ""],
               ["75−79", "1.864", "0.870−3.992", "", "1.219", "0.472−3.149", ""], ["80+", "3.259", "1.584−6.703", "***", "1.712", "0.660−4.440", ""],
               ["Poor Health", "4.319", "2.326−8.020", "**", "4.223", "1.672−10.66", "**"], ["Overweight", "10.513", "5.419−20.39", "***", "17.269", "7.730−38.58", "***"],
               ["No", "0.483", "0.341−0.684", "***", "0.637", "0.409−0.990", "*"]]


def test_a_ratio_its_interval_is_not_made_around_is_found_in_published_tables(tmp_path):
    """A ratio whose interval is not centred on it on the log scale (a Wald interval is exp(ln OR ± 1.96·SE)) had been
    held only to lie inside it. PMC7940880's DM row, 1.15 (1.01–1.24) beside P = 0.0002 (the interval centres on 1.12 —
    1.114 to 1.124 with its printed digits — and gives p ≈ .007), and PMC7868910's 65–69 row, 2.821 (1.541−3.253) (the
    upper limit is the row above's; the interval centres on 2.24), are found; the tables' other 16 and 17 ratios are not."""
    entries = _audit(tmp_path, _table("Table 3. Association between potential risk factors and SARS-CoV-2 infection.",
                                      ["Variable", "OR (95% CI)", "P value"], _PMC7940880))
    assert len(entries) == 17
    assert [(e.found, e.codes) for e in entries if e.codes] == [("OR = 1.15, 95% CI [1.01, 1.24], p = 0.0002", ["ratio-does-not-fit"])]
    assert "not at the centre" in entries[8].message and "centre on the log scale 1.119" in entries[8].message
    entries = _audit(tmp_path, _table("Table 3. Crude odds ratios (CORs) and adjusted odds ratios (AORs) of rick factors associated with hypertension.",
                                      ["Variable", "COR", "95% CI", "P-value", "AOR", "95% CI", "P-value"], _PMC7868910,
                                      "***P < 0.01, ** < 0.05, * < 0.1; #Reference Category."))
    assert len(entries) == 18 and {e.found.split(" =")[0] for e in entries} == {"COR", "AOR"}  # (the heads had gone unread)
    assert [(e.found, e.codes) for e in entries if e.codes] == [("COR = 2.821, 95% CI [1.541, 3.253], p < 0.01", ["ratio-does-not-fit"])]
    assert entries[0].found == "COR = 1.773, 95% CI [1.043, 3.013], p < 0.05"  # ("**", defined without its P after "***P < 0.01")
    assert "AOR = 0.637, 95% CI [0.409, 0.990], p < 0.1" in [e.found for e in entries]
    restyled = {e.found.split(",")[0]: e.suggestion.split(",")[0] for e in audit_file(tmp_path / "t.md", suggest_all=True)}
    assert restyled["COR = 1.773"] == "OR = 1.77" and restyled["AOR = 1.535"] == "aOR = 1.54"  # (the adjusted ratio keeps its name)


# Sci Rep 2022 (PMC8885688), Table 2, "Univariate and multivariate logistic regression of factors associated with preterm
# birth" (a national birth cohort: narrow intervals), rows as published
_PMC8885688 = [["25 < Age ≤ 30", "0.90", "0.89–0.91", "0.87", "0.86–0.88"], ["30 < Age ≤ 35", "0.96", "0.95–0.97", "0.90", "0.88–0.91"],
               ["Age > 35", "1.11", "1.09–1.13", "1.01", "0.99–1.02"], ["< NT$20,000", "0.96", "0.95–0.97", "0.96", "0.95–0.98"],
               ["NT$20,000–$40,000", "0.98", "0.97–0.99", "1.00", "0.98–1.01"], ["> NT$40,000", "1.13", "1.11–1.14", "1.13", "1.11–1.15"],
               ["Multifetal pregnancy", "9.46", "9.15–9.77", "9.03", "8.73–9.33"], ["Placental abnormality", "1.77", "1.75–1.79", "1.72", "1.70–1.74"],
               ["Vaginal infection", "1.06", "1.05–1.08", "1.00", "0.98–1.01"], ["Autoimmune disease", "1.35", "1.32–1.39", "1.29", "1.25–1.32"],
               ["Hypertension complicating pregnancy", "3.36", "3.29–3.43", "3.16", "3.09–3.23"], ["Mild PD", "1.08", "1.07–1.09", "1.05", "1.04–1.06"]]

# Ann Med Surg 2020;60:680–685 (PMC7723764), Table 4, Cox models of overall survival (n = 165,465), crude and adjusted
# hazard ratios as published
_PMC7723764 = [["Male", "1.23 (1.22,1.25)", "<0.001", "1.17 (1.14,1.19)", "<0.001"], ["Black", "1.12 (1.10,1.15)", "<0.001", "0.98 (0.95,1.02)", "0.314"],
               ["NA", "1.39 (1.04,1.85)", "0.024", "1.17 (0.92,1.50)", "0.196"], ["Asian", "0.88 (0.80,0.97)", "0.012", "0.87 (0.79,0.97)", "0.010"],
               ["PI", "0.83 (0.59,1.16)", "0.268", "0.75 (0.50,1.12)", "0.162"], ["AIP", "0.86 (0.70,1.06)", "0.168", "0.97 (0.80,1.17)", "0.727"],
               ["Other", "0.95 (0.84,1.07)", "0.386", "0.94 (0.83,1.07)", "0.342"], ["Yes", "0.99 (0.96,1.01)", "0.205", "0.94 (0.89,0.99)", "0.015"],
               ["Middle-Low", "0.90 (0.89,0.92)", "<0.001", "0.96 (0.93,0.98)", "0.001"], ["Middle-High", "0.84 (0.82,0.85)", "<0.001", "0.92 (0.89,0.94)", "<0.001"],
               ["Highest", "0.77 (0.76,0.79)", "<0.001", "0.88 (0.84,0.91)", "<0.001"]]


def test_published_ratio_tables_that_fit_are_left_alone(tmp_path):
    """Two published tables whose every ratio fits its interval and p (narrow intervals printed to two decimals, where
    rounding moves the centre most): no finding. A p moved to another row (ours) is found by the p the interval gives,
    where the interval and p still agree about the null."""
    entries = _audit(tmp_path, _table("Table 2. Univariate and multivariate logistic regression of factors associated with preterm birth.",
                                      ["Variable", "OR", "95% CI", "OR", "95% CI"], _PMC8885688))
    assert len(entries) == 24 and not any(e.codes for e in entries)
    heads = ["Prognostic factors", "HR (95%CI)", "P value", "aHR (95%CI)", "P value"]
    caption = "Table 4. Cox Regression Models for Overall Survival Clustered Hospital, n = 165,465."
    entries = _audit(tmp_path, _table(caption, heads, _PMC7723764))
    assert len(entries) == 22 and not any(e.codes for e in entries)
    rows = [r[:] for r in _PMC7723764]
    rows[0][2] = "0.024"  # (ours: the NA row's p beside the men's HR, 1.23 (1.22, 1.25), whose interval gives z ≈ 30)
    (bad,) = [e for e in _audit(tmp_path, _table(caption, heads, rows)) if e.codes]
    assert bad.codes == ["ratio-does-not-fit"] and bad.found == "HR = 1.23, 95% CI [1.22, 1.25], p = 0.024" and "Altman & Bland" in bad.message


def _profile_interval(a: int, b: int, c: int, d: int) -> tuple[float, float]:
    """The profile-likelihood 95% interval of a 2 × 2 table's log odds ratio (as R's confint on a glm computes it)."""
    from scipy import optimize

    def loglik(b0: float, b1: float) -> float:
        p1, p0 = 1 / (1 + math.exp(-(b0 + b1))), 1 / (1 + math.exp(-b0))
        return a * math.log(p1) + b * math.log(1 - p1) + c * math.log(p0) + d * math.log(1 - p0)

    b1hat, b0hat = math.log(a * d / (b * c)), math.log(c / d)
    top, crit, se = loglik(b0hat, b1hat), stats.chi2.ppf(0.95, 1) / 2, math.sqrt(1 / a + 1 / b + 1 / c + 1 / d)

    def drop(b1: float) -> float:
        return top + optimize.minimize_scalar(lambda b0: -loglik(b0, b1), bracket=(b0hat - 1, b0hat + 1)).fun - crit

    return optimize.brentq(drop, b1hat - 8 * se, b1hat), optimize.brentq(drop, b1hat, b1hat + 8 * se)


def test_intervals_and_tests_of_other_methods_are_not_found(tmp_path):
    """Random 2 × 2 tables (20 to 3,000 subjects, odds ratios around 1 to 20) with the sample odds ratio, a Wald, profile-
    likelihood or exact conditional interval (scipy's) and a Wald, likelihood-ratio, Pearson, Yates or Fisher p (scipy's),
    printed to two or three decimals: none is found, in sentences or in a table. With the intervals shuffled between the
    rows (ours), some are."""
    rng = np.random.default_rng(31)
    texts = []
    while len(texts) < 160:
        n = int(rng.choice([20, 40, 100, 400, 3000]))
        p0, ratio = rng.uniform(0.05, 0.6), math.exp(rng.normal(0, 1))
        n1 = int(rng.integers(n // 4, 3 * n // 4))
        a, c = int(rng.binomial(n1, ratio * p0 / (1 - p0 + ratio * p0))), int(rng.binomial(n - n1, p0))
        b, d = n1 - a, n - n1 - c
        if min(a, b, c, d) == 0:
            continue
        est, se = math.log(a * d / (b * c)), math.sqrt(1 / a + 1 / b + 1 / c + 1 / d)
        method, test = len(texts) % 3, len(texts) // 3 % 5
        if method == 0:
            low, high = est - 1.96 * se, est + 1.96 * se
        elif method == 1:
            low, high = _profile_interval(a, b, c, d)
        else:
            ci = odds_ratio([[a, b], [c, d]], kind="conditional").confidence_interval()
            low, high = math.log(ci.low), math.log(ci.high)
        p = [2 * stats.norm.sf(abs(est / se)), stats.fisher_exact([[a, b], [c, d]])[1],
             stats.chi2_contingency([[a, b], [c, d]], correction=False)[1], stats.chi2_contingency([[a, b], [c, d]])[1],
             stats.chi2_contingency([[a, b], [c, d]], correction=False, lambda_="log-likelihood")[1]][test]
        places = 2 + len(texts) % 2
        if round(math.exp(low), places) <= 0:
            continue
        shown_p = "< 0.001" if p < 0.001 else f"= {p:.3f}"
        texts.append((f"{math.exp(est):.{places}f}", f"{math.exp(low):.{places}f}", f"{math.exp(high):.{places}f}", shown_p))
    prose = "\n\n".join(f"The odds were higher in group {i} (OR = {r}, 95% CI [{lo}, {hi}], p {p})." for i, (r, lo, hi, p) in enumerate(texts))
    entries = _audit(tmp_path, prose)
    assert len(entries) == len(texts) and not [e.found for e in entries if "ratio-does-not-fit" in e.codes]
    rows = [[f"v{i}", f"{r} ({lo}–{hi})", p.removeprefix("= ")] for i, (r, lo, hi, p) in enumerate(texts)]
    entries = _audit(tmp_path, _table("Table 2. Odds ratios of the outcome.", ["Variable", "OR (95% CI)", "P value"], rows))
    assert len(entries) == len(texts) and not [e.found for e in entries if "ratio-does-not-fit" in e.codes]
    order = rng.permutation(len(texts))
    shuffled = "\n\n".join(f"Group {i} (OR = {r}, 95% CI [{texts[order[i]][1]}, {texts[order[i]][2]}], p {p})." for i, (r, _, _, p) in enumerate(texts))
    assert sum("ratio-does-not-fit" in e.codes for e in _audit(tmp_path, shuffled)) >= 5  # (9 of 160; the others' intervals still fit or are found otherwise)


def test_interval_limits_set_off_by_a_tilde_or_a_minus_sign(tmp_path):
    """An interval's limits set off by a tilde, as East Asian journals type a range — "OR = 1.329, 95%CI = 1.277~1.384"
    in the abstract of "Prevalence and Influencing Factors of Central Obesity among Adults in China: China Nutrition and
    Health Surveillance (2015–2017)" (https://www.biocloudy.com/literatureDetail/Nzk1NjAwNQ==) — had not been read: the
    ratios were read without their intervals, and a revision would have restyled them without. Read now, all eight
    fitting; and a table's limits set off by the minus sign a typeset page prints for the dash ("1.043−3.013", PMC7868910
    above) or by the full-width tilde."""
    text = ("A logistic analysis suggested that the following factors were associated with central obesity: female sex [odds "
            "ratio (OR) = 1.329, 95%CI = 1.277~1.384]; increasing age [OR (95%CI): 1.146 (1.061~1.238), 1.254 (1.167~1.348)]; "
            "being married [OR = 1.184, 95%CI = 1.077~1.302]; being divorced or widowed [OR = 1.132, 95%CI = 1.006~1.273]; an "
            "urban setting [OR = 1.096, 95%CI = 1.061~1.132]; drinking [OR = 1.069, 95%CI = 1.031~1.109]; and screen time > 5 "
            "h [OR = 1.088, 95%CI = 1.036~1.141] were risk factors for central obesity; while sufficient physical activity "
            "[OR = 0.819, 95%CI = 0.782~0.858] was a protective factor.")
    entries = _audit(tmp_path, text)
    assert [e.found.split("CI")[-1] for e in entries] == [" = 1.277~1.384", "): 1.146 (1.061~1.238)", " = 1.077~1.302", " = 1.006~1.273",
                                                           " = 1.061~1.132", " = 1.031~1.109", " = 1.036~1.141", " = 0.782~0.858"]
    assert not any(set(e.codes) - {"decimals"} for e in entries)
    entries = _audit(tmp_path, text.replace("1.184, 95%CI = 1.077~1.302", "1.184, 95%CI = 1.077~1.502"))  # (ours)
    assert [e.codes for e in entries if set(e.codes) - {"decimals"}] == [["decimals", "ratio-does-not-fit"]]
    rows = [["55−59", "1.773", "1.043～3.013", "0.034"], ["60−64", "1.902", "1.112−3.253", "0.019"]]
    entries = _audit(tmp_path, _table("Table 3. Odds ratios of hypertension.", ["Variable", "OR", "95% CI", "P-value"], rows))
    assert [e.found for e in entries] == ["OR = 1.773, 95% CI [1.043, 3.013], p = 0.034", "OR = 1.902, 95% CI [1.112, 3.253], p = 0.019"]
    assert not any(e.codes for e in entries)


# PLoS One 2016 (PMC5125657), Table 2, "Factors predicting irritable bowel syndrome (IBS) incidence in Taiwan during
# 2003–2013": Poisson GEE incidence rate ratios, crude and adjusted, each with its interval and P value in columns of their
# own, the P heads with footnote letters ("P value a", "P valueb,c"), rows as published
_PMC5125657 = [["Year", "0.98", "0.98–0.99", "<.001", "0.97", "0.97–0.97", "<.001"], ["Age", "1.02", "1.02–1.02", "<.001", "1.03", "1.02–1.03", "<.001"],
               ["Female sex", "1.12", "1.10–1.14", "<.001", "1.14", "1.12–1.16", "<.001"], [">=40000", "0.95", "0.92–0.98", "<.001", "1.15", "1.12–1.19", "<.001"],
               ["20000–39999", "0.97", "0.95–0.99", "0.007", "1.09", "1.06–1.11", "<.001"], ["Urban", "0.89", "0.86–0.92", "<.001", "1.05", "1.01–1.09", "0.017"],
               ["Suburban", "0.87", "0.83–0.90", "<.001", "1.00", "0.96–1.04", "0.808"]]

# PMC9156757, Table 2, as published: "RR (CI95%)" (the level after the interval's name) and
# "ARR (CI95%)" (its note does not say what ARR stands for), rows as published
_PMC9156757 = [["HIV-positive", "7.20 (6.20–8.36)", "< 0.0001", "6.48 (5.37–7.83)", "< 0.0001"], ["Male", "1.59 (1.39–1.82)", "< 0.0001", "1.41 (1.17–1.71)", "< 0.0001"],
               ["4–7", "0.68 (0.43–1.06)", "0.092", "0.75 (0.48–1.16)", "0.192"], ["≥ 8", "0.34 (0.22–0.54)", "< 0.0001", "0.41 (0.26–0.64)", "< 0.0001"],
               ["Black", "1.17(0.85–1.61)", "0.336", "", ""], ["Amerindian", "4.47 (2.49–8.04)", "< 0.0001", "2.77 (1.46–5.28)", "0.002"],
               ["Rural area", "0.23 (0.13–0.38)", "< 0.0001", "0.44 (0.24–0.80)", "0.007"], ["Others", "1.59 (1.18–2.16)", "0.002", "1.36 (0.91–2.03)", "0.135"]]


def test_rate_hazard_and_risk_ratio_columns_are_read_as_odds_ratio_columns_are(tmp_path):
    """A ratio other than an odds ratio in a column of its own beside its interval's ("Crude IRR | 95% CI | P value a"),
    and a ratio's head with the level after the interval's name ("RR (CI95%)"), had left the tables unread (PMC5125657's 14
    incidence rate ratios, PMC9156757's 8 risk ratios). Read now with their p columns and names, each fitting; an
    "ARR" column, which names an absolute risk reduction as often as an adjusted risk ratio, is not taken for a ratio
    (an absolute risk reduction's "4.0 (0.3 to 7.7)" had been read as an adjusted RR: ours, after a trial's usual layout)."""
    entries = _audit(tmp_path, _table("Table 2. Factors predicting irritable bowel syndrome (IBS) incidence in Taiwan during 2003–2013 (N = 7 634 281).",
                                      ["Variables", "Crude IRR", "95% CI", "P value a", "Adjusted IRR", "95% CI", "P valueb,c"], _PMC5125657,
                                      "IRR = incidence rate ration; CI = confidence interval. a Tested by univariate Poisson regression with GEE model."))
    assert len(entries) == 14 and not any(e.codes for e in entries)
    assert entries[4].found == "Crude IRR = 1.12, 95% CI [1.10, 1.14], p < .001" and entries[13].found == "Adjusted IRR = 1.00, 95% CI [0.96, 1.04], p = 0.808"
    restyled = [e.suggestion for e in audit_file(tmp_path / "t.md", suggest_all=True)]
    assert restyled[4].startswith("IRR = 1.12, 95% CI [1.10, 1.14]")
    entries = _audit(tmp_path, _table("Table 2. Factors associated with the outcome.", ["Variable", "RR (CI95%)", "P", "ARR (CI95%)", "P"], _PMC9156757))
    assert [e.found for e in entries][:2] == ["RR = 7.20, 95% CI [6.20, 8.36], p < 0.0001", "RR = 1.59, 95% CI [1.39, 1.82], p < 0.0001"]
    assert len(entries) == 8 and not any(e.codes for e in entries)
    rows = [["Death", "12 (4.0)", "24 (8.0)", "4.0 (0.3 to 7.7)", "0.04"], ["Readmission", "30 (10.0)", "27 (9.0)", "−1.0 (−5.7 to 3.7)", "0.68"]]
    entries = _audit(tmp_path, _table("Table 2. Outcomes at 12 months.", ["Outcome", "Intervention, n (%)", "Control, n (%)", "ARR (95% CI)", "P value"], rows))
    assert [e.found for e in entries] == ["ARR = 4.0, 95% CI [0.3, 7.7]", "ARR = −1.0, 95% CI [−5.7, 3.7]"] and not any(e.codes for e in entries)


# PMC6291340, Table 3, as published: a linear mixed model, a logistic and a negative binomial
# model side by side ("Estimatea | 95% CI | P-value | ORa | 95% CI | P-value | IRRa | 95% CI | P-value", the heads' footnote
# letter glued on), rows as published — its "(0.29, 072)" and its reversed "(0.39, 0.04)" among them
_PMC6291340 = [["baseline vs year 1", "0.51", "(0.29, 072)", "<0.0001", "1.41", "(1.10, 1.82)", "0.0072", "1.45", "(1.30, 1.61)", "<0.0001"],
               ["1–8 years (per 1 year)", "-0.09", "(−0.12, −0.06)", "<0.0001", "0.94", "(0.91, 0.98)", "0.0066", "0.92", "(0.90, 0.94)", "<0.0001"],
               ["Age (per 10 years younger)", "0.21", "(0.39, 0.04)", "0.0159", "1.24", "(1.08, 1.44)", "0.0031", "1.12", "(1.04, 1.22)", "0.0031"],
               ["Gender (Female vs Male)", "0.55", "(0.17, 0.94)", "0.0052", "1.42", "(0.97, 2.09)", "0.0726", "1.47", "(1.20, 1.80)", "0.0002"],
               ["Black", "0.29", "(−0.13, 0.71)", "0.1769", "1.21", "(0.83, 1.76)", "0.3177", "1.16", "(0.94, 1.44)", "0.1633"],
               ["Other", "1.51", "(0.59, 2.42)", "0.0012", "2.20", "(1.23, 3.92)", "0.0077", "2.11", "(1.45, 3.06)", "<0.0001"],
               ["HS", "-0.12", "(−0.76, 0.51)", "0.7080", "1.50", "(0.89, 2.54)", "0.1304", "0.90", "(0.66, 1.21)", "0.4756"]]

# Sci Rep 2020 (s41598-020-60620-3), Table 3: negative binomial coefficients with their robust SEs, the IRRs and p, rows
# of it as published
_UK_BIOBANK = [["Low mood (n = 9289)", "−0.015 (0.008)", "0.984", "0.053"], ["Anhedonia (n = 9289)", "−0.013 (0.008)", "0.987", "0.122"],
               ["Tenseness (n = 9289)", "−0.007 (0.007)", "0.993", "0.339"], ["Low mood (n = 4817)", "−0.022 (0.010)", "0.978", "0.038"],
               ["Anhedonia (n = 4817)", "−0.025 (0.011)", "0.975", "0.033"], ["Tiredness (n = 4817)", "0.000 (0.007)", "1.000", "0.980"]]


def test_models_side_by_side_and_a_ratio_beside_its_coefficient(tmp_path):
    """A linear, a logistic and a count model side by side, each estimate with its own interval and p, had been read
    (once the heads' glued footnote letters were) as one model whose OR must be exp(Estimate): ten false findings.
    Each ratio column after an estimate whose own interval stands between them now starts a model of its own; the
    table's real slips are found: an interval printed reversed, and "072" (0.72, its point lost: read as 72, said). And a coefficient with its SE beside its exp(B)
    ("b (SE) | IRR | p"): each IRR held to exp(b) — the UK Biobank table's 0.984 beside b = −0.015 (exp: 0.9846 to 0.9856)."""
    heads = ["Multivariable models", "Estimatea", "95% CI", "P-value", "ORa", "95% CI", "P-value", "IRRa", "95% CI", "P-value"]
    entries = _audit(tmp_path, _table("Table 3. Linear mixed model, logistic and negative binomial regression of CESD scores.", heads, _PMC6291340,
                                      "CESD, Center for Epidemiologic Studies Depression Scale; CI, Confidence Interval; OR, Odds Ratio; IRR, Incident Rate Ratio."))
    assert len(entries) == 21 and [e.found.split(" =")[0] for e in entries[:3]] == ["B", "OR", "IRR"]
    assert sorted((e.found, e.codes) for e in entries if e.codes) == [("B = 0.21, 95% CI [0.39, 0.04], p = 0.0159", ["ci-reversed"]),
                                                                      ("B = 0.51, 95% CI [0.29, 072], p < 0.0001", ["malformed-number"])]  # (0.72's point lost)
    assert "OR = 1.41, 95% CI [1.10, 1.82], p = 0.0072" in [e.found for e in entries]
    entries = _audit(tmp_path, _table("Table 3 Associations between photoperiod and depressive symptoms.", ["Model", "b (SE)", "IRR", "p"], _UK_BIOBANK))
    assert [(e.found, e.codes) for e in entries if e.codes] == [("B = −0.015, SE = 0.008, IRR = 0.984, p = 0.053", ["coefficient-does-not-fit"])]
    assert "IRR = 0.984 is not exp(B): B = −0.015 gives 0.9846 to 0.9856" in entries[0].message and len(entries) == 6
    assert not [e.suggestion for e in audit_file(tmp_path / "t.md", suggest_all=True) if e.suggestion]  # (no record takes a B: no ratio restyled without it)


# Sci Rep 2025 (PMC12256607), Table 7, "Logistic regression analysis of the influencing factors of social participation
# potential classification": "b | Sb | Waldχ 2 | P | OR | 95% CI", rows of it as published (its "0684" and "20,532" among them)
_PMC12256607 = [["Constant", "− 3.917", "0.803", "23.795", "0.000", "", ""],
                ["Some or a little of the time = 010", "0.281", "0.261", "1.156", "0.282", "1.324", "0.794–2.210"],
                ["Most of all of the time = 100", "0.198", "0.373", "0.281", "0.596", "1.219", "0.587–20,532"],
                ["Depression", "− 0.038", "0.017", "4.759", "0.029", "0.936", "0.931–0.996"],
                ["IADL", "0.514", "0.122", "17.675", "0.000", "1.671", "1.315–2.123"],
                ["Country = 1", "− 0.380", "0.191", "3.944", "0.047", "0684", "0.470–0.995"],
                ["Not have = 1", "− 0.531", "0.176", "9.097", "0.003", "0.588", "0.417–0.830"]]


def test_a_coefficients_se_headed_sb(tmp_path):
    """"Sb" (S with b below: the SE of b, as Chinese journals head it) had not been read as the SE, so no Wald, OR or
    interval of PMC12256607's Table 7 was held to its b: now each is. The Depression row's OR, 0.936, is neither exp(b)
    (b = −0.038: 0.9622 to 0.9632) nor at its interval's centre (0.963: the digits transposed); "0684" is no ratio inside
    its interval; the other rows fit."""
    entries = _audit(tmp_path, _table("Table 7. Logistic regression analysis of the influencing factors of social participation potential classification.",
                                      ["Variable", "b", "Sb", "Waldχ 2", "P", "OR", "95% CI"], _PMC12256607))
    found = {e.found: e.codes for e in entries}
    assert found["Wald = 4.759, p = 0.029, OR = 0.936, 95% CI [0.931, 0.996]"] == ["coefficient-does-not-fit", "ratio-does-not-fit"]
    assert found["Wald = 3.944, p = 0.047, OR = 0684, 95% CI [0.470, 0.995]"] == ["malformed-number", "ci-excludes-estimate", "coefficient-does-not-fit"]
    assert len(entries) == 7 and sum(bool(c) for c in found.values()) == 2
    assert all("the B and SE columns" in e.notes[0] for e in entries)


# PMC6687807, Table 2, as published ("β | Wald c2 | P value | OR (95% CI)": the
# χ² of "Wald χ2" copied as "c2", Symbol's χ), rows of it as published
_PMC6687807 = [["Gender", "0.15", "0.474", "0.491", "1.162 (0.759–1.779)"], ["2 = 31–40 years", "− 0.824", "6.551", "0.01", "0.439 (0.234–0.825)"],
               ["2 = 6–10 years,", "− 2.772", "11.946", "0.001", "0.063 (0.013–0.301)"], ["1 = pig farmers", "1.713", "7.134", "0.068", "5.545 (1.011–30.424)"],
               ["2 = Slaughters", "2.396", "3.89", "0.049", "10.984 (1.650–73.130)"], ["1≦6 h", "− 0.008", "0", "0.985", "1.008 (0.452–2.247)"],
               ["2 = 7–9 h", "− 0.398", "1.012", "0.315", "0.670 (0.307–1.462)"]]


def test_a_wald_column_headed_wald_c2_beside_its_coefficient(tmp_path):
    """"Wald c2" (a copy's χ²) had not been read as a Wald column, and a Wald beside a coefficient without its SE had no
    df: a coefficient's Wald test has 1 df (its B beside it says the row is one coefficient's). PMC6687807's pig farmers
    row prints P = 0.068 beside Wald = 7.134 (p = .0076 on 1 df; its OR's interval, 1.011 to 30.424, excludes 1 too):
    found. And a β beside a column of ratios with their intervals, whose exp the ratio is in most rows, is the model's
    log odds: each ratio held to exp(β) — the 1≦6 h row's OR of 1.008 beside β = −0.008 (exp: 0.992, its sign lost) and
    the 7–9 h row's 0.670 beside β = −0.398 (0.6713 to 0.6720) are found; the other rows fit."""
    entries = _audit(tmp_path, _table("Table 2. Analysis for influent factors of the positive rates of anti-HEV IgG using logistic regression model.",
                                      ["Variables", "β", "Wald c2", "P value", "OR (95% CI)"], _PMC6687807))
    walds = [e for e in entries if e.found.startswith("Wald")]
    assert len(walds) == 7 and [(e.found, e.codes) for e in entries if e.codes] == [
        ("Wald = 7.134, p = 0.068", ["p-does-not-follow", "verdict-changes"]), ("OR = 1.008, 95% CI [0.452, 2.247], p = 0.985", ["coefficient-does-not-fit"]),
        ("OR = 0.670, 95% CI [0.307, 1.462], p = 0.315", ["coefficient-does-not-fit"])]
    assert "df = 1 (the Wald test of one coefficient: its B beside it)" in walds[3].checked
    assert "OR = 1.008 is not exp(B): B = − 0.008 gives 0.9915 to 0.9925" in [e for e in entries if e.found.startswith("OR = 1.008")][0].message



# Front Cell Infect Microbiol 2022;12:919414 (PMC9250988), Table 3, and Sci Rep 2017;7:43520 (PMC5335256), Table 4: Cox
# models' hazard ratios, as published
_PMC9250988 = """Table 3. Univariate and multivariate Cox regression analysis of risk factors for 30-day mortality.

| Variable | HR | 95%CI for HR | P value | aHRa | 95%CI for HR | P value |
|---|---|---|---|---|---|---|
| Sex, male vs female | 1.61 | 0.66-3.93 | 0.295 | | | |
| Age, year, ≥65 vs <65 | 1.90 | 0.94-3.85 | 0.074 | | | |
| Heart dysfunction | 2.21 | 1.07-4.56 | 0.031 | | | |
| WBC, 109/L, ≥14.3 vs <14.3 | 3.15 | 1.53-6.50 | 0.002 | | | |
| NEUT, 109/L, >11.9vs <11.9 | 3.37 | 1.63-6.96 | 0.001 | 3.12 | 1.08-8.98 | 0.035 |
| NLR, ≥10.3vs <10.3 | 4.37 | 1.99-9.58 | <0.001 | | | |
| PLT, 109/L, <75 vs ≥75 | 5.23 | 2.55-10.75 | <0.001 | | | |
| CRP, mg/L, ≥149 vs <149 | 8.34 | 3.48-19.96 | <0.001 | 4.41 | 1.45-13.45 | 0.009 |
| Effective treatment | 0.51 | 0.25-1.05 | 0.068 | | | |

aAdjusted hazard ratio for age and sex.
"""
_PMC5335256 = """Table 4. Cox proportional hazard analysis of risk for cardiovascular mortality in haemodialysis patients according to clinical predictors and circulating TNF related markers in univariate and multivariate models.

| Baseline Characteristics | HR (95% CI) | P | HR (95% CI) | P |
|---|---|---|---|---|
| Female gender | 0.31 (0.14–0.70) | 0.005 | 0.36 (0.16–0.81) | <0.01 |
| Age (10 yrs) | 1.28 (0.96–1.72) | 0.10 | | |
| Body mass index (1 kg/m2) | 0.98 (0.89–1.08) | 0.71 | | |
| SBP (10 mmHg) | 0.88 (0.75–1.03) | 0.12 | | |
| 140–160 (ref.) vs. <140 | 2.45 (1.10–5.45) | 0.03 | | |
| 140–160 (ref.) vs. > 160 | 1.73 (0.74–4.04) | 0.21 | | |
| DBP (10 mmHg) | 0.80 (0.60–1.08) | 0.14 | | |
| <80 (ref.) vs. ≥80 | 0.48 (0.24–0.99) | 0.045 | | |
| Prior CVD (0 = no; 1 = yes) | 3.97 (2.12–7.43) | <0.0001 | 3.86 (2.05–7.25) | <0.0001 |
| Albumin (1 g/dL) | 0.38 (0.18–0.81) | 0.01 | | |
| hs-CRP (1 mg/L) | 1.24 (1.04–1.48) | 0.02 | | |
| TNFα | 1.43 (0.73–2.82) | 0.30 | 0.33 (0.15–0.75) | 0.97 |
| TNFR1 | 2.18 (1.15–4.15) | 0.02 | 2.15 (1.13–4.10) | 0.02 |
| TNFR2 | 2.00 (1.04–3.83) | 0.04 | 1.54 (0.80–2.99) | 0.20 |
| TNFα (1SD = 0.29) | 1.21 (0.90–1.63) | 0.20 | 1.10 (0.80–1.50) | 0.57 |
| TNFR1 (1SD = 0.25) | 1.31 (0.94–1.83) | 0.12 | 1.19 (0.84–1.70) | 0.33 |
| TNFR2 (1SD = 0.24) | 1.50 (1.10–2.05) | <0.01 | 1.33 (0.97–1.82) | 0.09 |
"""


def test_hazard_ratio_tables_as_published(tmp_path):
    """Two published Cox tables. PMC9250988's ("HR | 95%CI for HR | P value | aHRa | 95%CI for HR | P value") had gone
    unread — an interval "for HR", a head with its footnote letter glued on —: its 11 ratios now read, all fitting.
    PMC5335256's 24 hazard ratios fit their intervals and p, and its multivariate TNFα row, 0.33 (0.15–0.75) beside P =
    0.97, is found."""
    entries = _audit(tmp_path, _PMC9250988)
    assert len(entries) == 11 and not any(e.codes for e in entries) and entries[5].found == "aHR = 3.12, 95% CI [1.08, 8.98], p = 0.035"
    entries = _audit(tmp_path, _PMC5335256)
    assert len(entries) == 25 and [(e.found, e.codes) for e in entries if e.codes] == [("HR = 0.33, 95% CI [0.15, 0.75], p = 0.97", ["ci-p-disagree"])]


# BMC Infect Dis 2021 (s12879-021-06057-z), Table 4: univariate and multivariable Cox models, "Hazards ratio (95% CI)", as published
_S12879 = """Table 4 Analysis of factors affecting mortality using both the univariate and multivariable Cox proportional hazards model

| | Hazards ratio (95% CI) | p value | Hazards ratio (95% CI) | p value |
|---|---|---|---|---|
| Gender (male) | 1.724 (1.103–2.694) | 0.017 | 0.885 (0.533–1.470) | 0.637 |
| Age# | 1.072 (1.055–1.089) | <0.001 | 1.066 (1.043–1.089) | < 0.001 |
| > 60 years* | 8.371 (4.701–14.910) | <0.001 | - | - |
| Diabetes | 2.187 (1.361–3.515) | 0.001 | 1.148 (0.676–1.952) | 0.609 |
| Hypertension | 2.012 (1.270–3.189) | 0.003 | 0.852 (0.508–1.428) | 0.543 |
| Coronary heart disease | 4.195 (2.198–8.008) | <0.001 | 1.081 (0.518–2.254) | 0.836 |
| White blood cell count # | 1.187 (1.138–1.238) | <0.001 | 1.135 (1.080–1.192) | < 0.001 |
| >10 × 109 per L & | 3.993 (2.469–6.459) | <0.001 | - | - |
| Ln (Glucose)# | 3.561 (2.221–5.708) | <0.001 | 1.844 (0.931–3.649) | 0.079 |
| Ln (AST)# | 3.452 (2.448–4.867) | <0.001 | 1.480 (0.983–2.229) | 0.060 |
| High C-reactive protein(>10 mg/L) | 18.960 (4.658–77.170) | <0.001 | 3.907 (0.900–16.970) | 0.069 |
| High Creatinine (>104 μmol/L) | 3.430 (1.981–5.938) | <0.001 | 1.209 (0.637–2.294) | 0.562 |
| Low Lymphocytes (<1 × 109 per L) | 3.776 (2.150–6.635) | <0.001 | 1.516 (0.820–2.803) | 0.185 |
"""


def test_a_hazards_ratio_head(tmp_path):
    """"Hazards ratio (95% CI)" (the plural "hazards") had been read as a bare estimate with its interval: no null of 1,
    no p. Now the table's 24 hazard ratios are read with their p's and checked, and fit."""
    entries = _audit(tmp_path, _S12879)
    assert len(entries) == 24 and not any(e.codes for e in entries)
    assert entries[0].found == "HR = 1.724, 95% CI [1.103, 2.694], p = 0.017"


# PMC6132365 (Clin Transl Sci 2018;11(5):487–497), Table 4, "Adjusted associations between willingness to participate in
# health research and sociodemographic characteristics…", "Multinomial logistic regression: odds ratios and 95% confidence
# intervals": each outcome's column under a head that names the comparison, not the ratio; rows as published (the marks'
# note, "*p < .05, **p < .01, ***p < .001", from memory of the journal's usual note: the page's own is cut off in the copy)
_PMC6132365 = [["18–24", "5.68*** (2.63,12.25)", "2.20 (0.84,5.76)"], ["25–34", "2.97*** (1.67,5.27)", "1.07 (0.52,2.23)"],
               ["35–44", "2.48** (1.49,4.12)", "1.07 (0.59,1.93)"], ["45–54", "2.15** (1.38,3.35)", "1.18 (0.70,1.97)"],
               ["55–64", "1.58** (1.10,2.27)", "1.17 (0.79,1.56)"], ["Female", "1.16 (0.87,1.51)", "1.13 (0.84,1.50)"],
               ["Black", "1.74* (1.14,2.67)", "1.39 (0.4,2.30)"], ["Hispanic", "2.06 (0.89,4.77)", "1.43 (0.52,3.89)"],
               ["Other", "1.08 (0.59,1.96)", "0.82 (0.37,1.84)"], ["Divorced/Separated", "1.62* (1.10,2.38)", "1.05 (0.67,1.67)"],
               ["Widowed", "1.00 (0.66,1.54)", "0.92 (0.61,1.38)"], ["Never Married", "1.12 (0.68,1.86)", "0.98 (0.54,1.79)"],
               ["Less Than High School", "0.51* (0.33,0.80)", "0.51* (0.30,0.86)"], ["High School Diploma/GED", "0.58** (0.43,0.87)", "0.60** (0.42,0.87)"],
               ["Nonemployed", "1.32 (0.85,2.06)", "1.19 (0.70,2.01)"], ["Retired", "0.91 (0.60,1.38)", "1.13 (0.75,1.70)"],
               ["Unable to Work", "1.19 (0.71,2.01)", "0.78 (0.41,1.46)"], ["100–199% FPL", "0.69 (0.44,1.08)", "0.74 (0.44,1.25)"],
               ["200–299% FPL", "0.72 (0.43,1.19)", "0.75 (0.41,1.35)"], ["300–399% FPL", "0.48* (0.26,0.88)", "0.57 (0.30,1.09)"],
               ["≥400% FPL", "0.68 (0.39,1.20)", "0.83 (0.46,1.50)"], ["Metro/urban", "0.90 (0.69,1.17)", "1.17 (0.84,1.62)"]]
_PMC6132365_CAPTION = ("Table 4. Adjusted associations between willingness to participate in health research and sociodemographic "
                       "characteristics, access to care, and health status. Multinomial logistic regression: odds ratios and 95% confidence intervals")


def test_a_ratio_the_caption_names_under_heads_that_name_the_outcomes(tmp_path):
    """Where the caption names one ratio and its 95% CI and the heads name the outcomes compared ("(yes vs. no)"), each
    "5.68*** (2.63,12.25)" cell is that ratio (adjusted where the caption says so), its marks its p; none had been read.
    PMC6132365's Table 4: all 44 read; its "1.39 (0.4,2.30)" is found — the interval centres on 0.96 on the log scale (a
    lower limit of 0.84 would centre it on 1.39) — and no other. The same rows under a caption or note that says the cells
    are medians with their IQR, or under heads that name them, are not read as ratios."""
    note = "Note. *p < .05, **p < .01, ***p < .001."
    entries = _audit(tmp_path, _table(_PMC6132365_CAPTION, ["Variables", "(yes vs. no)", "(undecided vs. no)"], _PMC6132365, note))
    assert len(entries) == 44 and all(e.found.startswith("aOR = ") for e in entries), [e.found for e in entries]
    assert entries[0].found == "aOR = 5.68, 95% CI [2.63, 12.25], p < .001"
    assert [(e.found, e.codes) for e in entries if e.codes] == [("aOR = 1.39, 95% CI [0.4, 2.30]", ["ratio-does-not-fit"])]
    assert math.isclose(math.exp((math.log(0.4) + math.log(2.30)) / 2), 0.959, abs_tol=5e-4)
    import docx  # (the same table in Word: read alike)

    d = docx.Document()
    d.add_paragraph(_PMC6132365_CAPTION)
    table = d.add_table(rows=len(_PMC6132365) + 1, cols=3)
    for r, row in enumerate([["Variables", "(yes vs. no)", "(undecided vs. no)"]] + _PMC6132365):
        for c, text in enumerate(row):
            table.cell(r, c).text = text
    d.add_paragraph(note)
    d.save(str(tmp_path / "ratios.docx"))
    assert [(e.found, e.codes) for e in audit_file(tmp_path / "ratios.docx")] == [(e.found, e.codes) for e in entries]
    for caption, heads in ((_PMC6132365_CAPTION + "; values are median (IQR)", ["Variables", "(yes vs. no)", "(undecided vs. no)"]),
                           (_PMC6132365_CAPTION, ["Variables", "Median (IQR), yes", "Median (IQR), undecided"])):
        assert not _audit(tmp_path, _table(caption, heads, _PMC6132365, note)), (caption, heads)


# PMC8392743 (BMJ Open 2021;11:e045845), Table 2, "Logistic regression results for the impact of the COVID-19 pandemic on
# unmet healthcare needs", as SAS prints a logistic model: the OR, its "95% Wald confidence limits" in two columns under
# one head, and "Pr >Χ2" (SAS's "Pr > ChiSq" as the journal set it); rows as published
_PMC8392743 = [["Woman", "1.83", "1.141", "2.936", "0.012"], ["Age", "0.975", "0.953", "0.997", "0.028"],
               ["Some college and above", "0.486", "0.278", "0.848", "0.011"], ["Yes", "1.178", "0.588", "2.359", "0.644"],
               ["Yes", "1.004", "0.459", "2.196", "0.992"], ["Blue-collar job or self-employed", "0.653", "0.35", "1.217", "0.180"],
               ["Economically inactive population", "0.532", "0.308", "0.92", "0.024"], ["Good", "1.578", "0.992", "2.509", "0.054"],
               ["1 chronic disease", "2.234", "1.263", "3.952", "0.006"], ["2 or more chronic diseases", "2.341", "1.081", "5.067", "0.031"],
               ["Yes", "1.042", "0.583", "1.861", "0.890"], ["Yes", "2.353", "1.284", "4.312", "0.006"],
               ["Above $1675 and less than $2512", "0.665", "0.298", "1.484", "0.319"], ["Above $2512 and less than $4187", "0.973", "0.417", "2.271", "0.950"],
               ["Above $4187", "0.487", "0.17", "1.394", "0.180"], ["Yes", "1.047", "0.666", "1.646", "0.843"],
               ["Perceived susceptibility", "1.178", "0.869", "1.598", "0.291"], ["Perceived severity", "1.218", "0.889", "1.669", "0.219"],
               ["High", "1.358", "0.864", "2.136", "0.185"], ["Fear", "1.432", "1.017", "2.017", "0.040"],
               ["Stigma", "0.818", "0.617", "1.085", "0.163"], ["Yes", "0.675", "0.334", "1.365", "0.274"]]


def test_sas_confidence_limits_under_one_head_and_its_p_head(tmp_path):
    """SAS's layout — "OR | 95% Wald Confidence Limits (over two columns) | Pr > ChiSq" — had not been read at all. As a
    Markdown table (the second limit's head empty) and as a Word table (the head merged over both), PMC8392743's 22 odds
    ratios are read with their limits and p, and none is found (each p is the interval's: Woman's 1.83 (1.141–2.936)
    gives z = 2.51, p = .012); a p moved to 0.12 and a ratio moved off its interval's centre are."""
    import docx

    heads = ["Effect", "OR", "95% Wald confidence limits", "", "Pr >Χ2"]
    caption = "Table 2. Logistic regression results for the impact of the COVID-19 pandemic on unmet healthcare needs"
    entries = _audit(tmp_path, _table(caption, heads, _PMC8392743))
    assert len(entries) == 22 and not [e.codes for e in entries if e.codes], [(e.found, e.codes) for e in entries if e.codes]
    assert entries[0].found == "OR = 1.83, 95% CI [1.141, 2.936], p = 0.012"
    se = (math.log(2.936) - math.log(1.141)) / (2 * stats.norm.isf(0.025))
    assert f"{2 * stats.norm.sf(math.log(1.83) / se):.3f}" == "0.012"
    rows = [r[:] for r in _PMC8392743]
    rows[0][4], rows[8][1] = "0.12", "3.234"
    for head in ("Pr >Χ2", "Pr > ChiSq"):
        moved = _audit(tmp_path, _table(caption, heads[:4] + [head], rows))
        assert [(e.found, e.codes) for e in moved if e.codes] == [("OR = 1.83, 95% CI [1.141, 2.936], p = 0.12", ["ci-p-disagree"]),
                                                                 ("OR = 3.234, 95% CI [1.263, 3.952], p = 0.006", ["ratio-does-not-fit"])]
    d = docx.Document()
    d.add_paragraph(caption)
    table = d.add_table(rows=len(rows) + 1, cols=5)
    for c, text in enumerate(heads):
        table.cell(0, c).text = text
    table.cell(0, 2).merge(table.cell(0, 3)).text = "95% Wald confidence limits"
    for r, row in enumerate(rows, start=1):
        for c, text in enumerate(row):
            table.cell(r, c).text = text
    d.save(str(tmp_path / "sas.docx"))
    found = audit_file(tmp_path / "sas.docx")
    assert len(found) == 22 and [e.codes for e in found if e.codes] == [["ci-p-disagree"], ["ratio-does-not-fit"]], [(e.found, e.codes) for e in found]
