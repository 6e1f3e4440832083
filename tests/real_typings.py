"""Statistics as real authors typed them, for measuring the audit on text
nobody here wrote (tests/test_audit_real.py).

Each item is a short quotation — the statistic and the few words or table
cells around it — from an open-access publication, preprint, thesis,
published analysis output or open textbook, with its address. Nothing here
was written for statsetter; typos, odd spacing, line breaks and the
authors' errors are kept as printed. Tables are given as their rows
(header rows first) and become Word tables in the test.

The truth of each statistic is what its source states: the test, its df
(printed, or as the source gives it elsewhere: group sizes in the header, a
df column, an error row) and the reported p. Whether the p follows is not
written here: the test computes it with scipy.
"""

from __future__ import annotations

from dataclasses import dataclass

# the sources, with what they are
SOURCES = {
    "osf-vibrm": ("https://osf.io/vibrm/wiki/home", "a laboratory's results page of a registered replication report (OSF)"),
    "authorea-630743": ("https://flame-challenge.authorea.com/users/597901/articles/630743/download_zip", "a preprint on stress and creativity (Authorea)"),
    "pmc10908010": ("https://pmc.ncbi.nlm.nih.gov/articles/PMC10908010/table/Tab3", "BMC Psychiatry 2024;24:174, Table 3 (PMC, open access)"),
    "pmc4476782": ("https://pmc.ncbi.nlm.nih.gov/articles/PMC4476782/table/pone.0131065.t003", "PLOS ONE 2015, Table 3 (PMC, open access)"),
    "pmc9582993": ("https://pmc.ncbi.nlm.nih.gov/articles/PMC9582993/table/T6", "Table 6, ERP ANOVA tables (PMC, open access)"),
    "pmc12588921": ("https://pmc.ncbi.nlm.nih.gov/articles/PMC12588921/table/tab5/", "Table 5, independent-samples t tests (PMC, open access)"),
    "pmc10964721": ("https://pmc.ncbi.nlm.nih.gov/articles/PMC10964721/table/tab3", "Table 3, baseline comparison of two groups (PMC, open access)"),
    "bmc-s12909-016-0812-0": ("https://bmcmededuc.biomedcentral.com/articles/10.1186/s12909-016-0812-0/tables/5", "BMC Medical Education 2016, Table 5 (open access)"),
    "bmc-s12909-019-1501-6": ("https://bmcmededuc.biomedcentral.com/articles/10.1186/s12909-019-1501-6/tables/2", "BMC Medical Education 2019, Table 2 (open access)"),
    "teffelen-thesis": ("https://publicatie-online.nl/uploaded/flipbook/147602-Martijn-van-Teffelen/130", "a doctoral thesis, chapter 6, p. 130 (published online)"),
    "lboro-12017007": ("https://repository.lboro.ac.uk/ndownloader/articles/12017007/versions/1", "analysis output published with a data set (Loughborough University repository)"),
    "york-bland": ("http://www-users.york.ac.uk/~mb55/msc/ytustats/chi2ex4.htm", "a university statistics course's worked answer (open course page)"),
    "hyperstat": ("https://davidmlane.com/hyperstat/B147521.html", "HyperStat online textbook, reporting results (open textbook)"),
}


@dataclass(frozen=True)
class Stat:
    """One reported test as its source states it."""

    symbol: str  # t, F, chi2, r
    df: tuple[float, ...]  # as the source gives it (printed, or from the table's group sizes, df columns or error row); () not given
    value: str  # the statistic as printed ("< 1" for a bound)
    p: str  # the p as printed: "= .24", "< .001", "ns", "= 0.000"
    one_sided: bool = False  # the source says the test was one-tailed
    df_printed: bool = True  # False: the df is not beside the statistic (a table's header, a df column, group sizes)


@dataclass(frozen=True)
class Text:
    source: str
    text: str
    stats: tuple[Stat, ...]


@dataclass(frozen=True)
class Table:
    source: str
    caption: str
    rows: tuple[tuple[str, ...], ...]  # header rows first, as printed
    stats: tuple[Stat, ...]  # in reading order


def _f(df1: float, df2: float, value: str, p: str, printed: bool = True) -> Stat:
    return Stat("F", (df1, df2), value, p, df_printed=printed)


ITEMS: tuple[Text | Table, ...] = (
    Text("osf-vibrm", "in ratings of amusement when viewing the cartoons, t(97) = 0.72, p = .24, one-tailed.",
         (Stat("t", (97,), "0.72", "= .24", one_sided=True),)),
    Text("osf-vibrm", "than participants in the smile condition (M = 4.43, SD = 2.22), t(97) = 2.03, p = .05, and",
         (Stat("t", (97,), "2.03", "= .05"),)),
    Text("osf-vibrm", "than participants in the smile condition (M = 7.04, SD = 1.81), t(97) = -2.31, p = .02.",
         (Stat("t", (97,), "-2.31", "= .02"),)),
    Text("authorea-630743",
         "For AUT fluency, no significant main effects of Time, F (1, 61)\n=0.92, p = .342, \\(\\eta_{p}^{2}\\) = 0.02, or Group, F (1,\n"
         "61) = 0.91, p = .343, \\(\\eta_{p}^{2}\\) = 0.02 were observed, but\nthere was a significant Time × Group interaction, F (1,\n"
         "61) = 6.50, p = .013, \\(\\eta_{p}^{2}\\) = 0.10.",
         (_f(1, 61, "0.92", "= .342"), _f(1, 61, "0.91", "= .343"), _f(1, 61, "6.50", "= .013"))),
    Text("authorea-630743",
         "For AUT flexibility, there no significant main effects of Time,F (1, 61) = 0.235, p = .630, \\(\\eta_{p}^{2}\\) = 0.004, or\n"
         "Group, F (1, 61) = 0.711, p = .403, \\(\\eta_{p}^{2}\\) =\n0.01. In addition, no significant Time × Group interaction was observed,"
         "F (1, 61) = 3.61, p = .062, \\(\\eta_{p}^{2}\\) = 0.06.",
         (_f(1, 61, "0.235", "= .630"), _f(1, 61, "0.711", "= .403"), _f(1, 61, "3.61", "= .062"))),
    Text("authorea-630743",
         "a significant main effect of Group was observed,F (1, 61) = 9.568, p = .003, \\(\\eta_{p}^{2}\\) = 0.14,\nalthough the main "
         "effect of Time was not significant, F (1, 61) =\n0.001, p = .972, \\(\\eta_{p}^{2}\\) < 0.001. However, a\nsignificant Time × "
         "Group interaction occurred, F (1, 61) = 21.66,p < .001, \\(\\eta_{p}^{2}\\) = 0.26.",
         (_f(1, 61, "9.568", "= .003"), _f(1, 61, "0.001", "= .972"), _f(1, 61, "21.66", "< .001"))),
    Text("authorea-630743",
         "no significant main effect of\nTime, F (1, 61) =1.01, p = .320, \\(\\eta_{p}^{2}\\) = 0.02,\nor Group, F (1, 61) = 0.74, "
         "p = .394, \\(\\eta_{p}^{2}\\) =\n0.01, were observed. In addition, the interaction effect of Time × Group\nwas not significant, "
         "F (1, 61) = 1.35, p = .249,\\(\\eta_{p}^{2}\\) = 0.02.",
         (_f(1, 61, "1.01", "= .320"), _f(1, 61, "0.74", "= .394"), _f(1, 61, "1.35", "= .249"))),
    Text("authorea-630743",
         "showed that there were significant main effects of Group, F (1,\n61) = 6.05, p = .017, \\(\\eta_{p}^{2}\\) = 0.09, and Time,F "
         "(4, 244) = 13.07, p < .001, \\(\\eta_{p}^{2}\\) =\n0.18. The interaction of Time and Group was also significant,F (4, 244) "
         "=8.59, p < .001, \\(\\eta_{p}^{2}\\) =\n0.12.",
         (_f(1, 61, "6.05", "= .017"), _f(4, 244, "13.07", "< .001"), _f(4, 244, "8.59", "< .001"))),
    Text("authorea-630743",
         "showed significant main effects of Time, F (4, 244) = 21.85,p < .001, \\(\\eta_{p}^{2}\\) = 0.26, and Group,F (1, 61) = "
         "4.73, p = .034, \\(\\eta_{p}^{2}\\) = 0.07. The\ninteraction of Time and Group was also significant, F (4, 244) =\n4.81, "
         "p = .003, \\(\\eta_{p}^{2}\\)= 0.07.",
         (_f(4, 244, "21.85", "< .001"), _f(1, 61, "4.73", "= .034"), _f(4, 244, "4.81", "= .003"))),
    Text("teffelen-thesis",
         "findings on benign bias revealed that the condition by time interaction ( F (1, 18) = 5.30, p = .034) factor was "
         "significant, whereas the time ( F (1, 18) = 3.82, p = .066) and condition ( F (1, 18) = 0.05, p = .829) were not significant.",
         (_f(1, 18, "5.30", "= .034"), _f(1, 18, "3.82", "= .066"), _f(1, 18, "0.05", "= .829"))),
    Text("teffelen-thesis",
         "findings on hostile bias showed that the main effect of time was significant ( F (1, 18) = 9.70, p = .006), whereas",
         (_f(1, 18, "9.70", "= .006"),)),
    Text("teffelen-thesis",
         "Follow-up t -tests showed that benign bias significantly increased from pre- to post-intervention in the CBM-I condition "
         "( t = 2.93, p = .019), but not in the AC condition ( t = 0.26, p = .803)",
         (Stat("t", (), "2.93", "= .019", df_printed=False), Stat("t", (), "0.26", "= .803", df_printed=False))),
    Text("york-bland", "The invalid chi-squared test would give chi-squared = 6.00, df = 1, P = 0.014.",
         (Stat("chi2", (1,), "6.00", "= 0.014"),)),
    Text("hyperstat", "was significantly greater than 0.50, χ²(1, N = 100) = 5.29, p = 0.021.",
         (Stat("chi2", (1,), "5.29", "= 0.021"),)),
    Table("pmc10908010", "Analyses of repeated measures (MSC n = 25, TAU n = 22)",
          (("Outcome Domains", "Group", "Time*group", "Within-subjects"),
           ("Hope", "MSC", "F (2–90) = 87.89, p < .001, η2 = .66", "F (2–48) = 153.75, p < .001, η2 = .88"),
           ("", "TAU", "", "F (2–42) = 2.04, P = .14, η2 = .09"),
           ("Anger-Hostility", "MSC", "F (2–90) = 43.42, p < .001, η2 = .49", "F (2–48) = 40.24, p < .001, η2 = .71"),
           ("", "TAU", "", "F (2–42) = 7.16, P = .01, η2 = .43"),
           ("Anxiety", "MSC", "F (2–90) = 35.19, p < .001, η2 = .44", "F (2–48) = 47.97, p < .001, η2 = .67"),
           ("", "TAU", "", "F (2–42) = 1.88, P = .17, ns, η2 = .06"),
           ("Interpersonal Sensitivity", "MSC", "F (2–86) = 25.63, p < .001, η2 = .37", "F (2–48) = 44.17, p = .001, η2 = .64"),
           ("", "TAU", "", "F (2–38) = 12.10, p < .001, η2 = .39")),
          (_f(2, 90, "87.89", "< .001"), _f(2, 48, "153.75", "< .001"), _f(2, 42, "2.04", "= .14"), _f(2, 90, "43.42", "< .001"),
           _f(2, 48, "40.24", "< .001"), _f(2, 42, "7.16", "= .01"), _f(2, 90, "35.19", "< .001"), _f(2, 48, "47.97", "< .001"),
           _f(2, 42, "1.88", "= .17"), _f(2, 86, "25.63", "< .001"), _f(2, 48, "44.17", "= .001"), _f(2, 38, "12.10", "< .001"))),
    Table("pmc4476782", "Experiment 1: Results from a 3 (sound sequence) × 2 (valence) repeated-measures ANOVA",
          (("", "", "", "", "", "", "", ""),
           ("Rating", "Valence", "F (1,56) = 1101.8", "η2 = .952", "p < .001", "", "", ""),
           ("", "Sound", "F (1,56) = 3.0", "η2 = .051", "p = .09", "F (1,56) < 1", "η2 = .002", "n.s."),
           ("", "Valence x Sound", "F (1,56) = 7.4", "η2 = .117", "p < .01", "F (1,56) = 1.7", "η2 = .952", "n.s."),
           ("RT", "Valence", "F (1,56) = 21.9", "η2 = .282", "p < .001", "", "", ""),
           ("", "Sound", "F (1,56) = 1.7", "η2 = .020", "n. s.", "F (1,56) = 2.3", "η2 = .040", "n.s."),
           ("", "Valence x Sound", "F (1,56) < 1", "η2 = .004", "n. s.", "F (1,56) < 1", "η2 = .003", "n.s."),
           ("SCR", "Valence", "F (1,56) = 21.5", "η2 = .277", "p < .001", "", "", ""),
           ("", "Sound", "F (1,56) = 6.0", "η2 = .096", "p < .05", "F (1,56) < 1", "η2 = .003", "n.s."),
           ("", "Valence x Sound", "F (1,56) < 1", "η2 = .000", "n.s.", "F (1,56) < 1", "η2 = .000", "n.s."),
           ("SF", "Sound", "F (1,56) = 1.2", "η2 = .022", "n.s.", "F (1,56) < 1", "η2 = .008", "n.s.")),
          (_f(1, 56, "1101.8", "< .001"), _f(1, 56, "3.0", "= .09"), _f(1, 56, "< 1", "ns"), _f(1, 56, "7.4", "< .01"),
           _f(1, 56, "1.7", "ns"), _f(1, 56, "21.9", "< .001"), _f(1, 56, "1.7", "ns"), _f(1, 56, "2.3", "ns"), _f(1, 56, "< 1", "ns"),
           _f(1, 56, "< 1", "ns"), _f(1, 56, "21.5", "< .001"), _f(1, 56, "6.0", "< .05"), _f(1, 56, "< 1", "ns"), _f(1, 56, "< 1", "ns"),
           _f(1, 56, "< 1", "ns"), _f(1, 56, "1.2", "ns"), _f(1, 56, "< 1", "ns"))),
    Table("pmc9582993", "Event-related potential mean amplitude ANOVA tables",
          (("Dual-task emotion perception—P1", "df(num)", "df(den)", "F", "p", "η g 2"),
           ("Group", "1", "36", "1.16", "0.289", "0.012"),
           ("Emotion", "2", "72", "0.36", "0.702", "0.000"),
           ("Group x emotion", "2", "72", "1.66", "0.198", "0.000"),
           ("Emotion x SOA", "4", "144", "0.68", "0.609", "0.000"),
           ("Group x emotion x SOA", "4", "144", "2.13", "0.080", "0.001"),
           ("Emotion x SOA x channel", "8", "288", "0.55", "0.817", "0.000"),
           ("Group x emotion x SOA x channel", "8", "288", "0.55", "0.820", "0.000"),
           ("Dual-task emotion perception—P3", "df(num)", "df(den)", "F", "p", "η g 2"),
           ("Group", "1", "36", "0.54", "0.466", "0.005"),
           ("Emotion", "2", "72", "8.52", "< 0.001", "0.002"),
           ("Emotion x SOA", "4", "144", "0.63", "0.644", "0.000")),
          (_f(1, 36, "1.16", "= 0.289", False), _f(2, 72, "0.36", "= 0.702", False), _f(2, 72, "1.66", "= 0.198", False),
           _f(4, 144, "0.68", "= 0.609", False), _f(4, 144, "2.13", "= 0.080", False), _f(8, 288, "0.55", "= 0.817", False),
           _f(8, 288, "0.55", "= 0.820", False), _f(1, 36, "0.54", "= 0.466", False), _f(2, 72, "8.52", "< 0.001", False),
           _f(4, 144, "0.63", "= 0.644", False))),
    Table("pmc12588921", "Independent samples t-test of pre- and post-test SPD scores between the intervention and control groups.",
          (("Subjects", "Group (mean ± SD)", "", "t", "p"),
           ("", "Control group (n = 30)", "Intervention group (n = 30)", "", ""),
           ("Pre-test SPD", "33.03 ± 3.41", "32.93 ± 3.69", "0.109", "0.914"),
           ("Post-test SPD", "34.13 ± 5.49", "41.77 ± 6.85", "−4.763", "0.000**")),
          (Stat("t", (58,), "0.109", "= 0.914", df_printed=False), Stat("t", (58,), "−4.763", "= 0.000", df_printed=False))),
    Table("pmc10964721", "Comparison of baseline scores between the two groups.",
          (("Item", "Intervention group (n = 45)", "Control group (n = 45)", "t", "p"),
           ("Total nursing ability score (x ± s)", "95.35 ± 12.13", "96.24 ± 13.21", "0.438", "0.665"),
           ("Knowledge score (x ± s)", "16.67 ± 4.43", "17.23 ± 3.67", "1.382", "0.180"),
           ("Skill score (x ± s)", "49.23 ± 4.45", "48.34 ± 5.23", "−0.569", "0.574"),
           ("Self-stress and health management score (x ± s)", "16.56 ± 2.67", "16.58 ± 2.21", "0.839", "0.401"),
           ("Coping strategies score (x ± s)", "15.34 ± 2.34", "15.23 ± 2.94", "0.132", "0.896"),
           ("ZBI score (x ± s)", "39.23 ± 7.23", "41.56 ± 7.34", "−0.255", "0.800"),
           ("MAS score (x ± s)", "20.45 ± 6.36", "21.67 ± 6.43", "1.423", "0.110"),
           ("BI score (x ± s)", "43.19 ± 8.89", "42.87 ± 9.78", "0.055", "0.956"),
           ("SAS score (x ± s)", "35.13 ± 4.87", "35.92 ± 4.34", "0.987", "0.381"),
           ("SDS score (x ± s)", "36.23 ± 4.78", "36.43 ± 3.23", "1.122", "0.556")),
          tuple(Stat("t", (88,), v, f"= {p}", df_printed=False) for v, p in (
              ("0.438", "0.665"), ("1.382", "0.180"), ("−0.569", "0.574"), ("0.839", "0.401"), ("0.132", "0.896"), ("−0.255", "0.800"),
              ("1.423", "0.110"), ("0.055", "0.956"), ("0.987", "0.381"), ("1.122", "0.556")))),
    Table("bmc-s12909-016-0812-0", "Comparison between the mean and standard deviation of scores obtained from OSCE test in 10 stations",
          (("Evaluation station", "Before Intervention", "After Intervention", "T test", "Df", "Sig"),
           ("1 Measuring blood pressure", "9.28 ± 0.88", "8.80 ± 0.797", "0.775", "38", "0.079"),
           ("2 Dressing change", "8.97 ± 0.865", "8.15 ± 1.40", "1.793", "38", "0.031"),
           ("3 Measuring body temperature", "8.25 ± 1.99", "8.25 ± 2.41", "0.481", "38", "0.972"),
           ("4 Colostomy care", "8.27 ± 1.03", "8.24 ± 0.554", "0.286", "38", "0.257"),
           ("5 Wound care clinical scenario", "7.95 ± 1.60", "8.65 ± 1.26", "1.300", "38", "0.134"),
           ("6- Clinical bowel care scenario", "7.57 ± 1.97", "5.79 ± 1.75", "3.016", "38", "0.005"),
           ("7- Pressure ulcer care", "9.87 ± 0.55", "8.68 ± 1.83", "2.769", "38", "0.052"),
           ("8- Oxygen therapy", "8.31 ± 1.42", "7.56 ± 1.48", "1.630", "38", "0.111"),
           ("9- Vital signs scenario", "7.99 ± 1.85", "5.29 2.48", "3.890", "38", "<0.001"),
           ("10- Identifying devices", "9.37 ± 1.59", "8.37 ± 3.03", "1.731", "38", "0.086")),
          tuple(Stat("t", (38,), v, p, df_printed=False) for v, p in (
              ("0.775", "= 0.079"), ("1.793", "= 0.031"), ("0.481", "= 0.972"), ("0.286", "= 0.257"), ("1.300", "= 0.134"),
              ("3.016", "= 0.005"), ("2.769", "= 0.052"), ("1.630", "= 0.111"), ("3.890", "< 0.001"), ("1.731", "= 0.086")))),
    Table("bmc-s12909-019-1501-6", "Characteristics of participants and homogeneity tests between the experimental and control groups (N = 42)",
          (("Variables", "Experimental Group (n = 22)", "Control Group (n = 22)", "χ2 or t", "p value"),
           ("Outcome variables (range of score)", "Mean ± SD", "Mean ± SD", "t", "p value"),
           ("EBP knowledge (1–5)", "3.26 ± 0.40", "3.27 ± 0.46", "−0.12", "0.907"),
           ("EBP attitudes (1–5)", "3.67 ± 0.36", "3.79 ± 0.32", "−1.15", "0.256"),
           ("EBP competencies (1–5)", "3.06 ± 0.48", "3.04 ± 0.61", "0.14", "0.891"),
           ("Future use of EBP (1–5)", "3.83 ± 0.51", "3.84 ± 0.55", "−0.08", "0.936"),
           ("Critical thinking (1–5)", "3.39 ± 0.35", "3.35 ± 0.49", "0.33", "0.744")),
          tuple(Stat("t", (42,), v, f"= {p}", df_printed=False) for v, p in (
              ("−0.12", "0.907"), ("−1.15", "0.256"), ("0.14", "0.891"), ("−0.08", "0.936"), ("0.33", "0.744")))),
    Table("lboro-12017007", "One Sample T-Test",
          (("", "t", "df", "p", "Cohen's d"), ("OfficialScore", "10.663", "1168", "< .001", "0.312")),
          (Stat("t", (1168,), "10.663", "< .001", df_printed=False),)),
    Table("lboro-12017007", "ANOVA - OfficialScore",
          (("Cases", "Sum of Squares", "df", "Mean Square", "F", "p", "η²"),
           ("Gender", "3238.986", "1", "3238.986", "8.410", "0.004", "0.007"),
           ("Form", "610.898", "1", "610.898", "1.586", "0.208", "0.001"),
           ("Gender ✻ Form", "202.005", "1", "202.005", "0.525", "0.469", "4.462e -4"),
           ("Residuals", "448683.306", "1165", "385.136", "", "", "")),
          (_f(1, 1165, "8.410", "= 0.004", False), _f(1, 1165, "1.586", "= 0.208", False), _f(1, 1165, "0.525", "= 0.469", False))),
    Table("lboro-12017007", "Independent Samples T-Test (official score by gender)",
          (("", "t", "df", "p", "Cohen's d"), ("OfficialScore", "2.941", "1167", "0.003", "0.177")),
          (Stat("t", (1167,), "2.941", "= 0.003", df_printed=False),)),
    Table("lboro-12017007", "Independent Samples T-Test (official score by version)",
          (("", "t", "df", "p", "Cohen's d"), ("OfficialScore", "1.559", "1167", "0.119", "0.091")),
          (Stat("t", (1167,), "1.559", "= 0.119", df_printed=False),)),
)
