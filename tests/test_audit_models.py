"""Regression models side by side, a model to each column, with each model's F, R² and ΔR² in rows under the
coefficients (hierarchical regression tables): a model's F against its R², its k predictors (the coefficients in its
column) and N (the caption's or the table's N row) — F = (R²/k) / ((1 − R²)/(N − k − 1)), or a step's F change from
its ΔR². The truth: statsmodels' OLS fits of its bundled Fair (1978) affairs data, and a published table (PMC8968192)."""

from __future__ import annotations

import docx
import statsmodels.api as sm
from statsmodels.datasets import fair

from statsetter.audit.report import audit_file
from test_audit_ratios import _audit, _table  # (a table as Markdown, audited)


_STEPS = [["age", "yrs_married"], ["age", "yrs_married", "children", "religious"],
          ["age", "yrs_married", "children", "religious", "educ", "occupation"]]


def _fair_rows() -> list[list[str]]:
    """Three nested models of marriage rating in statsmodels' Fair data (6,366 women), as a hierarchical regression table
    prints them: each predictor's B in the models that hold it, then the models' F, R² and ΔR², three decimals."""
    data = fair.load_pandas().data
    fits = [sm.OLS(data["rate_marriage"], sm.add_constant(data[cols])).fit() for cols in _STEPS]
    rows = [[name] + [f"{m.params[name]:.3f}" if name in m.params else "" for m in fits] for name in _STEPS[-1]]
    rows.insert(0, ["Constant"] + [f"{m.params['const']:.3f}" for m in fits])
    rows.append(["F"] + [f"{m.fvalue:.3f}" for m in fits])
    rows.append(["R2"] + [f"{m.rsquared:.3f}" for m in fits])
    rows.append(["ΔR2"] + [f"{m.rsquared - (fits[i - 1].rsquared if i else 0):.3f}" for i, m in enumerate(fits)])
    return rows


def test_each_models_f_follows_from_its_r_squared_predictors_and_n(tmp_path):
    """statsmodels' three nested fits, printed as a table: each F is read on (k, N − k − 1) df — 2, 4 and 6 predictors,
    the constant not one — and none is found. The same table under a caption whose N is not the models' (8,000, where
    the fits used 6,366) has every F found, with the N that would give it; so has an F typed wrong (54.109 → 45.109).
    A table that keeps predictors out of sight ("Controls | Yes | Yes | Yes") is not held to the coefficients it shows."""
    rows = _fair_rows()
    heads = ["Predictor", "Model 1", "Model 2", "Model 3"]
    entries = _audit(tmp_path, _table("Table 2. Hierarchical regression of marriage rating (N = 6,366)", heads, rows))
    assert [e.found for e in entries] == ["F(2, 6363) = 54.109", "F(4, 6361) = 47.108", "F(6, 6359) = 35.651"], [e.found for e in entries]
    assert not [e.codes for e in entries if e.codes]
    wrong_n = _audit(tmp_path, _table("Table 2. Hierarchical regression of marriage rating (N = 8,000)", heads, rows))
    assert len(wrong_n) == 3 and all(e.codes == ["effect-does-not-fit"] for e in wrong_n), [(e.found, e.codes) for e in wrong_n]
    assert "N = 8,000 (the N the caption or note gives)" in wrong_n[0].message and "would give it" in wrong_n[0].message
    low, high = (int(x.replace(",", "")) for x in wrong_n[0].message.split("N from ")[1].split(" would")[0].split(" to "))
    assert low <= 6366 <= high, wrong_n[0].message
    typo = [r[:] for r in rows]
    typo[-3][1] = "45.109"
    found = _audit(tmp_path, _table("Table 2. Hierarchical regression of marriage rating (N = 6,366)", heads, typo))
    assert [e.codes for e in found] == [["effect-does-not-fit"], [], []], [(e.found, e.codes) for e in found]
    hidden = rows[:3] + [["Controls", "Yes", "Yes", "Yes"]] + rows[3:]
    assert not _audit(tmp_path, _table("Table 2. Hierarchical regression of marriage rating (N = 8,000)", heads, hidden))
    with_n = rows + [["N", "6,366", "6,366", "6,366"]]  # (a model's own N row, over the caption's)
    assert not [e.codes for e in _audit(tmp_path, _table("Table 2. Hierarchical regression (N = 8,000)", heads, with_n)) if e.codes]


# PMC8968192 (Front Psychol 2022), Table 3, "Hierarchical linear regression analysis models (N = 1,218)": ten models'
# standardized coefficients with their marks, then each model's F, R² and ΔR², as published
_PMC8968192 = [
    ["Control variables"] + [""] * 10,
    ["Gender", "−0.069*", "−0.052*", "−0.066*", "–0.026", "−0.069*", "–0.045", "0.011", "0.041", "0.016", "0.044"],
    ["Academic year", "−0.087**", "−0.066**", "−0.063*", "0.017", "−0.058*", "–0.022", "−0.061*", "–0.027", "–0.055", "–0.023"],
    ["Major", "–0.047", "–0.040", "–0.035", "0.002", "–0.024", "0.001", "–0.050", "–0.026", "–0.044", "–0.013"],
    ["Subjective academic performance", "−0.158**", "−0.077**", "−0.166**", "0.070**", "−0.127**", "−0.091**", "−0.149**", "−0.077**", "−0.114**", "−0.077**"],
    ["Annual household income", "0.108**", "0.048*", "0.006", "0.057**", "–0.029", "−0.059*", "−0.062*", "−0.107**", "−0.085**", "−0.113**"],
    ["Mediating variable"] + [""] * 10,
    ["PsyCap", "", "", "", "0.589**", "", "0.578**", "", "0.436**", "", "0.490**"],
    ["Independent variable"] + [""] * 10,
    ["Self-esteem", "", "0.637**", "", "", "0.400**", "0.024", "", "", "0.234**", "−0.083*"],
    ["F", "9.365**", "135.486**", "6.818**", "104.828**", "44.040**", "89.751**", "6.342**", "48.740**", "16.327**", "40.415**"],
    ["R 2", "0.043**", "0.438**", "0.030**", "0.362**", "0.190**", "0.376**", "0.028**", "0.209**", "0.081**", "0.214**"],
    ["ΔR2", "0.043**", "0.395**", "0.030**", "0.332**", "0.156**", "0.337**", "0.028**", "0.182**", "0.054**", "0.186**"]]


def test_a_published_tables_models_were_not_fitted_to_its_n(tmp_path):
    """PMC8968192's ten models: none of their F's follows from its R², its predictors and the caption's N = 1,218, as
    the model's F or as the step's F change from its ΔR² (M1: R² = .043 with five predictors and 1,218 cases gives F
    10.76 to 11.02, printed 9.365; M4: R² = .362 with six gives 114.27 to 114.77, printed 104.828, and its ΔR² = .332 on
    the one predictor it adds to M3 gives about 630); their F's want 1,036 to 1,137 cases. Each is said with the N that
    would give it, in Markdown and in Word alike; before, nothing in the table was read."""
    heads = ["Variables"] + [f"M{i} (β)" for i in range(1, 11)]
    caption = "TABLE 3. Hierarchical linear regression analysis models (N = 1,218)."
    note = "*p < 0.05, **P < 0.01."
    entries = _audit(tmp_path, _table(caption, heads, _PMC8968192, note))
    assert len(entries) == 10 and entries[0].found == "F(5, 1212) = 9.365, p < 0.01", [e.found for e in entries]
    assert all(e.codes == ["effect-does-not-fit"] for e in entries), [(e.found, e.codes) for e in entries]
    assert "they give 10.76 to 11.02; N from 1,036 to 1,061 would give it" in entries[0].message
    assert entries[0].suggestion == ""  # (its df are the audit's reading of the column and the caption's N: no restyled F on them)
    assert "they give 114.27 to 114.77, nor as a step's F change from ΔR² = 0.332 on 1 added" in entries[3].message
    assert (10.76, 11.02) == tuple(round(r / 5 / ((1 - r) / 1212), 2) for r in (0.0425, 0.0435))  # (the arithmetic, apart)
    d = docx.Document()
    d.add_paragraph(caption)
    table = d.add_table(rows=len(_PMC8968192) + 1, cols=11)
    for r, row in enumerate([heads] + _PMC8968192):
        for c, text in enumerate(row):
            table.cell(r, c).text = text
    d.add_paragraph(note)
    d.save(str(tmp_path / "models.docx"))
    assert [e.codes for e in audit_file(tmp_path / "models.docx")] == [e.codes for e in entries]
