"""Figures drawn from records, read back as a reader reads them (issue: figures).

Each figure is drawn as SVG and read without matplotlib's help: the y (or x)
axis is calibrated from two of its own tick marks and their printed labels,
and every point and error-bar end must sit where its value falls on that
axis, to within half an SVG unit (a point, 1/72 inch — finer than a pixel at
screen resolution). Values come from records of open data: R's PlantGrowth
(tests/open_data.py) for group means, whose 95% CIs R's t.test gives
(stored below), pingouin's penguins for cell means, a logistic and a linear
regression. The PNG's size and resolution, the Word file's picture with its
alt text and caption, LibreOffice's reading of it, refusals and the light
start are checked too.
"""

from __future__ import annotations

import math
import re
import subprocess
import sys
import zipfile
from pathlib import Path

import pingouin as pg
import pytest
from scipy import stats

from open_data import PLANTS
from statsetter import InputError, load_style
from statsetter.analyses import anova_oneway, factorial_anova, linear_regression, logistic_regression, pearson
from statsetter.export.figure_files import draw, write_figure
from statsetter.rendering.figures import figure

APA = load_style("apa7")
# R 4.x, run here (tests/r_reference.R): t.test(PlantGrowth$weight[PlantGrowth$group == g])$conf.int for ctrl, trt1, trt2 (95%)
R_PLANT_CI = {"ctrl": (4.614881556, 5.449118444), "trt1": (4.093238609, 5.228761391), "trt2": (5.209402145, 5.842597855)}


def _groups(svg: str, gid: str) -> str:
    start = svg.index(f'<g id="{gid}">')
    depth = 0
    for m in re.finditer(r"<g[ >]|</g>", svg[start:]):
        depth += 1 if m.group(0) != "</g>" else -1
        if depth == 0:
            return svg[start : start + m.end()]
    raise AssertionError(gid)


def _axis(svg: str, which: str) -> "callable":
    """value -> SVG coordinate on the x or y axis, from two ticks and their labels (log axes: labels as numbers, log-mapped)."""
    ticks = []
    for i in range(1, 30):
        if f'<g id="{which}tick_{i}">' not in svg:
            break
        block = _groups(svg, f"{which}tick_{i}")
        pos = float(re.search(rf'<use [^>]*{"x" if which == "x" else "y"}="([\d.]+)"', block).group(1))
        label = re.search(r"<text[^>]*>([^<]+)</text>", block)
        if label:
            try:
                ticks.append((float(label.group(1).replace("−", "-")), pos))
            except ValueError:
                continue
    (v1, p1), (v2, p2) = ticks[0], ticks[-1]
    return lambda v: p1 + (v - v1) * (p2 - p1) / (v2 - v1)


def _bars(svg: str, gid: str) -> list[tuple[float, float, float, float]]:
    """Each error bar of a group as (x1, y1, x2, y2)."""
    return [tuple(map(float, m.groups())) for m in re.finditer(r'd="M ([\d.]+) ([\d.]+) \nL ([\d.]+) ([\d.]+) \n"', _groups(svg, gid))]


def _marks(svg: str, gid: str) -> list[tuple[float, float]]:
    return [(float(x), float(y)) for x, y in re.findall(r'<use [^>]*x="([\d.]+)" y="([\d.]+)"', _groups(svg, gid))]


def test_means_points_and_error_bars_sit_at_their_values():
    record = anova_oneway(PLANTS, "weight", "group").main
    model = figure(record, "means", APA)
    svg = draw(model, APA, "svg").decode()
    y_of = _axis(svg, "y")
    bars, points = _bars(svg, "errorbar-0"), _marks(svg, "means-0")
    assert len(bars) == len(points) == 3 and model.categories == ("ctrl", "trt1", "trt2")
    for (x1, top, x2, bottom), (px, py), g in zip(bars, points, record.groups):
        low, high = R_PLANT_CI[g.label]
        assert abs(min(top, bottom) - y_of(high)) < 0.5 and abs(max(top, bottom) - y_of(low)) < 0.5  # SVG y grows downwards
        assert abs(py - y_of(g.mean)) < 0.5 and abs(px - x1) < 0.5
    assert "95% confidence intervals of each mean" in model.note.plain() and model.note.plain().startswith("Note.")
    assert model.title.plain() == "Mean Weight by Group"


def test_bars_when_the_style_says_so_start_at_zero():
    import dataclasses

    bars_style = dataclasses.replace(APA, data={**APA.data, "figures": {**APA.figures, "means": "bars"}})
    model = figure(anova_oneway(PLANTS, "weight", "group"), "means", bars_style)
    svg = draw(model, bars_style, "svg").decode()
    y_of = _axis(svg, "y")
    assert "Bars show means" in model.note.plain()
    for j, g in enumerate(anova_oneway(PLANTS, "weight", "group").main.groups):
        corners = [float(v) for v in re.findall(r"[ML] [\d.]+ ([\d.]+)", _groups(svg, f"bar-0-{j}"))]
        assert abs(min(corners) - y_of(g.mean)) < 0.5 and abs(max(corners) - y_of(0.0)) < 0.5  # the bar's top at M, its foot at 0


def test_interaction_cells_and_their_intervals():
    d = pg.read_dataset("penguins")
    terms = factorial_anova(d, "body_mass_g", ("species", "sex"), labels={"body_mass_g": "body mass (g)"})
    model = figure(terms, "interaction", APA)
    assert [s.name for s in model.series] == ["Adelie", "Chinstrap", "Gentoo"] and model.categories == ("female", "male")
    svg = draw(model, APA, "svg").decode()
    y_of = _axis(svg, "y")
    cells = {g.label: g for g in terms[2].groups}
    for i, s in enumerate(model.series):
        for (x1, a, x2, b), (px, py), sex in zip(_bars(svg, f"errorbar-{i}"), _marks(svg, f"means-{i}"), model.categories):
            g = cells[f"{s.name} × {sex}"]
            half = stats.t.ppf(0.975, g.n - 1) * g.sd / math.sqrt(g.n)  # scipy's t quantile, independent of statsetter's
            assert abs(py - y_of(g.mean)) < 0.5
            assert abs(min(a, b) - y_of(g.mean + half)) < 0.5 and abs(max(a, b) - y_of(g.mean - half)) < 0.5
    assert model.legend == "Species" and "a line for each level of species" in model.note.plain()


def test_forest_plot_on_a_log_axis_and_on_a_linear_one():
    d = pg.read_dataset("penguins")
    fit = logistic_regression(d, "sex", ["bill_depth_mm", "bill_length_mm"])
    model = figure(fit, "forest", APA)
    assert model.log_scale and model.reference == 1.0 and "logarithmic" in model.note.plain()
    svg = draw(model, APA, "svg").decode()
    ticks = [(float(v), float(x)) for x, v in re.findall(r'<use [^>]*x="([\d.]+)" y="[\d.]+"[^>]*/>\s*</g>\s*</g>\s*<g id="text_\d+">\s*<text[^>]*>([\d.]+)</text>', svg)]
    (v1, p1), (v2, p2) = ticks[0], ticks[-1]

    def x_of(v: float) -> float:
        return p1 + (math.log(v) - math.log(v1)) * (p2 - p1) / (math.log(v2) - math.log(v1))

    coefficients = [r for r in fit if r.kind == "logistic_coefficient" and not r.details.get("intercept")]
    bars = _bars(svg, "errorbar-0")
    for r, (x1, y1, x2, y2) in zip(coefficients, bars):
        odds = r.effect("OR")
        assert abs(min(x1, x2) - x_of(odds.ci.low)) < 0.5 and abs(max(x1, x2) - x_of(odds.ci.high)) < 0.5
    linear = figure(linear_regression(d, "body_mass_g", ["flipper_length_mm", "bill_depth_mm"]), "forest", APA)
    assert not linear.log_scale and linear.reference == 0.0 and "a coefficient of zero" in linear.note.plain()


def test_scatter_line_is_the_least_squares_line_of_the_record():
    d = pg.read_dataset("penguins")
    record = pearson(d, "flipper_length_mm", "body_mass_g")
    model = figure(record, "scatter", APA, data=d)
    fit = [r for r in linear_regression(d, "body_mass_g", ["flipper_length_mm"]) if r.details.get("term") == "flipper_length_mm"][0]
    intercept = [r for r in linear_regression(d, "body_mass_g", ["flipper_length_mm"]) if r.details.get("intercept")][0]
    (x0, x1), (y0, y1) = model.series[1].x, model.series[1].y
    assert y0 == pytest.approx(intercept.estimate.value + fit.estimate.value * x0, rel=1e-9)
    assert y1 == pytest.approx(intercept.estimate.value + fit.estimate.value * x1, rel=1e-9)
    assert all(lo < mid < hi for lo, mid, hi in zip(model.band[1], [y0 + (y1 - y0) * (x - x0) / (x1 - x0) for x in model.band[0]], model.band[2]))
    svg = draw(model, APA, "svg").decode()
    x_of, y_of = _axis(svg, "x"), _axis(svg, "y")
    line = re.search(r'd="M ([\d.]+) ([\d.]+) \nL ([\d.]+) ([\d.]+) \n"', _groups(svg, "line")).groups()
    assert abs(float(line[0]) - x_of(x0)) < 0.5 and abs(float(line[1]) - y_of(y0)) < 0.5 and abs(float(line[3]) - y_of(y1)) < 0.5
    assert "N = 342" in model.note.plain()


def test_png_size_dpi_and_the_three_files(tmp_path):
    from PIL import Image

    model = figure(anova_oneway(PLANTS, "weight", "group"), "means", APA)
    written = write_figure(model, APA, tmp_path, "plants")
    assert sorted(written.files) == ["pdf", "png", "svg"] and written.png is not None
    with Image.open(tmp_path / "plants.png") as im:
        assert im.size == (1950, 1200) and round(im.info["dpi"][0]) == 300  # 6.5 × 4 inches at 300 dpi
    assert (tmp_path / "plants.pdf").read_bytes().startswith(b"%PDF")
    assert draw(model, APA, "svg") == draw(model, APA, "svg")  # deterministic: no dates, fixed ids


def test_an_interaction_figure_of_a_factor_labelled_with_markup_characters():
    """A factor's label holding "<" or "&" (a band such as "age < 40 & retired") stays text in the figure's note: it had
    been parsed as markup and stopped the run (found by running the demo plan with random labels). Penguins data."""
    d = pg.read_dataset("penguins")
    terms = factorial_anova(d, "body_mass_g", ("species", "sex"), labels={"species": "Species (<3 kg & more)"})
    model = figure(terms, "interaction", APA)
    assert "a line for each level of species (<3 kg & more);" in model.note.plain()
    assert b"&lt;3 kg &amp; more" in draw(model, APA, "svg")


@pytest.mark.parametrize("kind", ["means", "interaction", "forest", "scatter"])
def test_one_figure_saved_three_ways_is_each_format_drawn_afresh(tmp_path, kind):
    """write_figure builds and lays out a figure once and saves it as PNG, SVG and PDF: each file has the bytes of
    that format drawn from a figure of its own (open data: PlantGrowth, penguins, a logistic and a linear regression)."""
    penguins = pg.read_dataset("penguins")
    made = {"means": lambda: (anova_oneway(PLANTS, "weight", "group"), None),
            "interaction": lambda: (factorial_anova(penguins, "body_mass_g", ("species", "sex")), None),
            "forest": lambda: (logistic_regression(penguins, "sex", ["bill_depth_mm", "bill_length_mm"]), None),
            "scatter": lambda: (pearson(penguins, "flipper_length_mm", "body_mass_g"), penguins)}[kind]
    records, data = made()
    model = figure(records, kind, APA, data=data) if data is not None else figure(records, kind, APA)
    written = write_figure(model, APA, tmp_path, kind)
    for fmt in ("png", "svg", "pdf"):
        assert (tmp_path / f"{kind}.{fmt}").read_bytes() == draw(model, APA, fmt), fmt
    assert written.png == draw(model, APA, "png")


def test_word_picture_with_alt_text_and_caption(tmp_path):
    from statsetter.export.docx_writer import results_document, save_document

    from test_docx import pdf_text

    model = figure(anova_oneway(PLANTS, "weight", "group"), "means", APA, number=1)
    path = tmp_path / "figure.docx"
    save_document(results_document([model], APA, title="Figures"), path)
    with zipfile.ZipFile(path) as z:
        xml = z.read("word/document.xml").decode()
        assert any(n.startswith("word/media/") for n in z.namelist())
    assert 'descr="Mean Weight by Group. Mean weight by group: ctrl 5.03' in xml
    caption = xml.index(">Figure 1<"), xml.index(">Mean Weight by Group<"), xml.index("<w:drawing>"), xml.index(">Note.<")
    assert list(caption) == sorted(caption)  # number, title, picture, note in that order
    assert xml.count("<w:keepNext/>") >= 3  # number and title kept with the picture
    text = " ".join(pdf_text(path).split())  # LibreOffice opens it and lays the caption out around the picture
    assert "Figure 1 Mean Weight by Group" in text and "Note. Points show means" in text
    pdf = tmp_path / "figure.pdf"
    subprocess.run(["soffice", "--headless", "--convert-to", "pdf", "--outdir", str(tmp_path), str(path)], capture_output=True, timeout=180)
    images = subprocess.run(["pdfimages", "-list", str(pdf)], capture_output=True, text=True).stdout
    assert len(images.strip().splitlines()) >= 3  # a header, a rule and at least one image


def test_ama_caption_on_one_line():
    from statsetter.export.figure_blocks import figure_text

    ama = load_style("ama11")
    model = figure(anova_oneway(PLANTS, "weight", "group"), "means", ama, number=2).with_files({"png": "f.png", "svg": "f.svg", "pdf": "f.pdf"})
    assert figure_text(model, "md", ama).startswith("**Figure 2.** Mean Weight by Group\n\n![")
    assert figure_text(model, "md", APA).startswith("**Figure 2**\n\n*Mean Weight by Group*\n\n![")
    html = figure_text(model, "html", APA)
    assert html.startswith('<figure class="statsetter-figure"><figcaption><b>Figure 2</b>') and 'src="f.svg"' in html and "alt=" in html
    assert "\\includegraphics[width=\\linewidth]{f.pdf}" in figure_text(model, "tex", APA)
    # APA's legend starts with an italic "Note."; AMA's has none (its tables' footnotes neither: tests/golden/tables)
    assert model.note.plain().startswith("Points show means")
    assert figure(anova_oneway(PLANTS, "weight", "group"), "means", APA).note.plain().startswith("Note. Points show means")


def test_records_without_the_numbers_are_refused():
    from statsetter import GroupSummary, Result, Statistic

    bare = Result(kind="anova_oneway", statistic=Statistic("F", 4.8, (2, 27)), p=0.016, groups=(GroupSummary("a", n=10, mean=5.0), GroupSummary("b")))
    with pytest.raises(InputError, match="no n, mean and SD"):
        figure(bare, "means", APA)
    with pytest.raises(InputError, match="no groups"):
        figure(Result(kind="anova_oneway", statistic=Statistic("F", 4.8, (2, 27)), p=0.016), "means", APA)
    with pytest.raises(InputError, match="cell means"):
        figure(anova_oneway(PLANTS, "weight", "group"), "interaction", APA)
    with pytest.raises(InputError, match="pass the data"):
        figure(pearson(pg.read_dataset("penguins"), "flipper_length_mm", "body_mass_g"), "scatter", APA)
    with pytest.raises(InputError, match="no coefficients"):
        figure(anova_oneway(PLANTS, "weight", "group"), "forest", APA)
    with pytest.raises(InputError, match="kind 'pie'"):
        figure(anova_oneway(PLANTS, "weight", "group"), "pie", APA)


def test_light_start_and_a_missing_extra_named():
    code = ("import sys; import statsetter, statsetter.rendering.figures, statsetter.plan; "
            "print('matplotlib' in sys.modules)")
    assert subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True).stdout.strip() == "False"
    blocked = ("import sys; sys.modules['matplotlib'] = None\n"
               "from statsetter.errors import MissingExtra\n"
               "from statsetter.export.figure_files import draw\n"
               "from statsetter.rendering.figures import FigureModel, Series\n"
               "from statsetter import load_style, StyledText\n"
               "m = FigureModel('means', StyledText('T'), StyledText('N'), 'x', 'y', (Series('a', (0.0,), (1.0,), (0.5,), (1.5,)),), ('a',))\n"
               "try:\n    draw(m, load_style('apa7'), 'png')\nexcept MissingExtra as e:\n    print(e)\n")
    out = subprocess.run([sys.executable, "-c", blocked], capture_output=True, text=True, check=True).stdout
    assert "drawing a figure needs matplotlib" in out and "statsetter[figures]" in out


def test_a_plan_without_matplotlib_exits_3_and_writes_nothing(tmp_path):
    import shutil

    root = Path(__file__).resolve().parents[1]
    shutil.copy(root / "demo" / "plan.toml", tmp_path / "plan.toml")
    sys.path.insert(0, str(root / "demo"))
    import generate

    generate.main(tmp_path / "data")
    (tmp_path / "out").mkdir()
    generate.make_chapter(tmp_path / "out" / "chapter-with-markers.docx")
    code = ("import sys; sys.modules['matplotlib'] = None\n"
            "from statsetter.cli import main\n"
            f"sys.exit(main(['run', {str(tmp_path / 'plan.toml')!r}]))\n")
    done = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, timeout=600)
    assert done.returncode == 3 and "statsetter[figures]" in done.stderr and "Traceback" not in done.stderr
    assert sorted(p.name for p in (tmp_path / "out").iterdir()) == ["chapter-with-markers.docx"]  # nothing half-written


# R 4.x (tests/r_reference.R): quantile(PlantGrowth$weight[PlantGrowth$group == g], c(.25, .5, .75)), type 7
R_PLANT_QUARTILES = {"ctrl": (4.5500, 5.1550, 5.2925), "trt1": (4.2075, 4.5500, 4.8700), "trt2": (5.2675, 5.4350, 5.7350)}


def test_medians_with_interquartile_ranges_for_a_rank_test():
    from statsetter.analyses import kruskal_wallis

    model = figure(kruskal_wallis(PLANTS, "weight", "group"), "means", APA)
    assert model.title.plain() == "Median Weight by Group" and "interquartile range" in model.note.plain()
    svg = draw(model, APA, "svg").decode()
    y_of = _axis(svg, "y")
    for (x1, a, x2, b), (px, py), (q1, median, q3) in zip(_bars(svg, "errorbar-0"), _marks(svg, "means-0"), R_PLANT_QUARTILES.values()):
        assert abs(py - y_of(median)) < 0.5 and abs(min(a, b) - y_of(q3)) < 0.5 and abs(max(a, b) - y_of(q1)) < 0.5


def test_a_table_1_variable_as_grouped_percentages_with_its_suppression():
    import dataclasses

    import pandas as pd

    from statsetter.analyses import describe

    d = pg.read_dataset("penguins")
    described = describe(d, ["species", "island", "body_mass_g"], group="sex").main
    model = figure(described, "categories", APA, variable="island")
    expected = pd.crosstab(d["sex"], d["island"], normalize="index") * 100  # pandas, independently of statsetter
    for s in model.series:
        assert list(s.y) == pytest.approx(list(expected.loc[s.name, list(model.categories)]), rel=1e-12)
    svg = draw(model, APA, "svg").decode()
    y_of = _axis(svg, "y")
    for i, s in enumerate(model.series):
        for j, pct in enumerate(s.y):
            corners = [float(v) for v in re.findall(r"[ML] [\d.]+ ([\d.]+)", _groups(svg, f"bar-{i}-{j}"))]
            assert abs(min(corners) - y_of(pct)) < 0.5
    assert model.legend == "Sex" and model.title.plain() == "Island by Sex"
    # counts the table suppresses for confidentiality are not drawn either
    hidden = dataclasses.replace(described, suppress_below=60)
    small = figure(hidden, "categories", APA, variable="island")
    assert any(math.isnan(p) for s in small.series for p in s.y) and "To protect confidentiality" in small.note.plain()
    with pytest.raises(InputError, match="no categorical variable"):
        figure(described, "categories", APA, variable="body_mass_g")


def test_a_house_style_sets_the_figures_and_bad_settings_are_refused(tmp_path):
    from statsetter import StyleError

    house = tmp_path / "house.toml"
    house.write_text('name = "house"\ntitle = "House"\nextends = "apa7"\n[figures]\nfont_size = 12\nwidth_in = 3.25\ndpi = 600\n'
                     'palette = ["#000000", "#555555"]\n', encoding="utf-8")
    style = load_style(house)
    svg = draw(figure(anova_oneway(PLANTS, "weight", "group"), "means", style), style, "svg").decode()
    assert 'width="234pt"' in svg.replace(".0pt", "pt") or 'width="234pt"' in svg  # 3.25 inches
    assert "font-size: 12px" in svg
    from PIL import Image
    import io

    with Image.open(io.BytesIO(draw(figure(anova_oneway(PLANTS, "weight", "group"), "means", style), style, "png"))) as im:
        assert im.size == (1950, 2400) and round(im.info["dpi"][0]) == 600
    bad = tmp_path / "bad.toml"
    bad.write_text('name = "bad"\ntitle = "Bad"\nextends = "apa7"\n[figures]\nfont_size = 30\n', encoding="utf-8")
    with pytest.raises(StyleError, match="font_size"):
        load_style(bad)


def test_scatter_refuses_text_columns_and_too_few_points():
    d = pg.read_dataset("penguins")
    record = pearson(d, "flipper_length_mm", "body_mass_g")
    with pytest.raises(InputError, match="not a column"):
        figure(record, "scatter", APA, data=d.drop(columns=["body_mass_g"]))
    with pytest.raises(InputError, match="complete pairs"):
        figure(record, "scatter", APA, data=d.head(2))
    with pytest.raises(InputError, match="body_mass_g: not numeric"):
        figure(record, "scatter", APA, data=d.assign(body_mass_g="heavy"))


def test_labels_with_dollars_and_tex_characters_draw():
    # a dollar sign would start matplotlib's mathtext; labels are the author's words and are drawn as typed
    model = figure(anova_oneway(PLANTS, "weight", "group", labels={"weight": "cost ($) per $ & 50%", "group": "type_{a} #1"}), "means", APA)
    for fmt in ("svg", "png", "pdf"):
        assert draw(model, APA, fmt)
    assert "Cost (\\$) per \\$ &amp; 50%" in draw(model, APA, "svg").decode()
