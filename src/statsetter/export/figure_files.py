"""A FigureModel drawn with matplotlib (imported here only, when a figure is
written; the optional extra ``statsetter[figures]``) as PNG, SVG and PDF.

The style's ``[figures]`` settings decide the font (sans serif at print
size), the size, the resolution and the greys, markers and line styles, so
that no series depends on colour. No grid, no top or right frame line, no
shadows (APA 7 §7.24–7.26, memory). Statistical symbols in axis labels are
italic (matplotlib mathtext). Output is deterministic: no dates in the
files, SVG text kept as text. The drawn artists carry ids (``means-0``,
``errorbar-0``, ``bar-0-1``, ``line``, ``band``) that tests and readers of the SVG can find.
"""

from __future__ import annotations

import io
import re
from pathlib import Path
from typing import TYPE_CHECKING, Any, Iterable

from ..errors import MissingExtra

if TYPE_CHECKING:
    from ..rendering.figures import FigureModel
    from ..style.profile import Style

__all__ = ["FORMATS", "draw", "write_figure"]

FORMATS = ("png", "svg", "pdf")
_ITALIC = re.compile(r"<i>(.*?)</i>")


def _text(markup: str) -> str:
    """Markup to matplotlib text: <i>M</i> as mathtext italic, other tags dropped."""
    import html

    def italic(m: "re.Match[str]") -> str:
        inner = re.sub(r"([\\{}_^%#&~])", r"\\\1", m.group(1)).replace(" ", r"\ ")
        return f"$\\mathit{{{inner}}}$"

    text = markup.replace("$", "\\$")  # a dollar in a label is a dollar, not the start of mathtext
    return html.unescape(re.sub(r"</?[a-z]+>", "", _ITALIC.sub(italic, text)))


def _matplotlib() -> Any:
    try:
        import matplotlib
    except ImportError:
        raise MissingExtra("matplotlib", "drawing a figure") from None
    return matplotlib


def _legend(ax: Any, model: "FigureModel", size: float, count: int) -> None:
    """The series' legend above the plot, clear of the data, titled by the factor whose levels they are."""
    ax.legend(frameon=False, fontsize=size, title=_text(model.legend) or None, title_fontsize=size, loc="lower center",
              bbox_to_anchor=(0.5, 1.0), ncol=min(count, 4))


def _figure(model: "FigureModel", style: "Style") -> Any:
    _matplotlib()
    from matplotlib.figure import Figure

    f = style.figures
    size = float(f.get("font_size", 10))
    palette = list(f.get("palette", ("#000000", "#7f7f7f"))) or ["#000000"]
    markers = list(f.get("markers", ("o", "s"))) or ["o"]
    dashes = list(f.get("line_styles", ("-", "--"))) or ["-"]
    fig = Figure(figsize=(float(f.get("width_in", 6.5)), float(f.get("height_in", 4.0))))
    ax = fig.add_subplot()
    ax.spines[["top", "right"]].set_visible(False)
    if f.get("grid", False):
        ax.grid(True, color="#dddddd", linewidth=0.5)
    ax.set_axisbelow(True)
    ax.tick_params(labelsize=size)
    if model.kind in ("means", "interaction"):
        bars = model.kind == "means" and f.get("means") == "bars"
        count = len(model.series)
        for i, s in enumerate(model.series):
            dodge = (i - (count - 1) / 2) * 0.08 if count > 1 else 0.0
            xs = [x + dodge for x in s.x]
            err = [[y - lo for y, lo in zip(s.y, s.low)], [hi - y for y, hi in zip(s.y, s.high)]]
            colour = palette[i % len(palette)]
            if bars:
                for j, patch in enumerate(ax.bar(xs, s.y, width=0.6, color="#d9d9d9", edgecolor="#000000", linewidth=0.8)):
                    patch.set_gid(f"bar-{i}-{j}")
                made = ax.errorbar(xs, s.y, yerr=err, fmt="none", ecolor="#000000", elinewidth=1, capsize=4)
            else:
                made = ax.errorbar(xs, s.y, yerr=err, fmt=markers[i % len(markers)], color=colour, ecolor=colour, elinewidth=1, capsize=4,
                                   markersize=6, linestyle=dashes[i % len(dashes)] if model.kind == "interaction" else "none",
                                   linewidth=1.2, label=s.name)
                made.lines[0].set_gid(f"means-{i}")
            made.lines[2][0].set_gid(f"errorbar-{i}")
        ax.set_xticks(range(len(model.categories)), [_text(c) for c in model.categories])
        ax.set_xlim(-0.5, len(model.categories) - 0.5)
        if bars:
            ax.set_ylim(bottom=0)
        if model.kind == "interaction":
            _legend(ax, model, size, count)
    elif model.kind == "categories":
        count = len(model.series)
        width = 0.8 / max(count, 1)
        hatches = ["", "//", "..", "xx", "\\\\", "--"]
        for i, s in enumerate(model.series):
            xs = [x + (i - (count - 1) / 2) * width for x in s.x]
            bars = ax.bar(xs, s.y, width=width * 0.95, color=palette[i % len(palette)] if count == 1 else ["#ffffff", "#bfbfbf", "#7f7f7f", "#404040"][i % 4],
                          edgecolor="#000000", linewidth=0.8, hatch=hatches[i % len(hatches)] if count > 4 else None, label=s.name)
            for j, patch in enumerate(bars):
                patch.set_gid(f"bar-{i}-{j}")
        ax.set_xticks(range(len(model.categories)), [_text(c) for c in model.categories])
        ax.set_ylim(0, 100)
        if count > 1:
            _legend(ax, model, size, count)
    elif model.kind == "scatter":
        points, line = model.series
        ax.scatter(points.x, points.y, s=14, facecolors="none", edgecolors="#404040", linewidths=0.7, gid="points")
        if model.band is not None:
            ax.fill_between(model.band[0], model.band[1], model.band[2], color="#cccccc", linewidth=0, gid="band")
        ax.plot(line.x, line.y, color="#000000", linewidth=1.5, gid="line")
    elif model.kind == "forest":
        (s,) = model.series
        positions = [len(model.categories) - 1 - y for y in s.y]  # the first coefficient on top
        err = [[x - lo for x, lo in zip(s.x, s.low)], [hi - x for x, hi in zip(s.x, s.high)]]
        made = ax.errorbar(s.x, positions, xerr=err, fmt="s", color="#000000", elinewidth=1, capsize=3, markersize=5, linestyle="none")
        made.lines[0].set_gid("means-0")
        made.lines[2][0].set_gid("errorbar-0")
        if model.reference is not None:
            ax.axvline(model.reference, color="#7f7f7f", linewidth=0.8, linestyle="--", gid="reference")
        if model.log_scale:
            from matplotlib.ticker import FuncFormatter, LogLocator, NullFormatter

            ax.set_xscale("log")
            ax.xaxis.set_major_locator(LogLocator(subs=(1.0, 2.0, 5.0)))
            ax.xaxis.set_major_formatter(FuncFormatter(lambda v, _: f"{v:g}"))
            ax.xaxis.set_minor_formatter(NullFormatter())
        ax.set_yticks(range(len(model.categories)), [_text(c) for c in reversed(model.categories)])
        ax.set_ylim(-0.7, len(model.categories) - 0.3)
    ax.set_xlabel(_text(model.x_label), fontsize=size)
    ax.set_ylabel(_text(model.y_label), fontsize=size)
    fig.tight_layout()
    return fig


_METADATA = {"png": {"Software": None}, "svg": {"Date": None, "Creator": None}, "pdf": {"CreationDate": None, "Creator": None, "Producer": None}}


def draw(model: "FigureModel", style: "Style", fmt: str) -> bytes:
    """The figure as the bytes of a ``png``, ``svg`` or ``pdf`` file."""
    return _drawn(model, style, (fmt,))[fmt]


def _drawn(model: "FigureModel", style: "Style", formats: Iterable[str]) -> dict[str, bytes]:
    """The figure built and laid out once, then saved in each format: the same bytes as building it afresh for each
    (tests/test_figures.py), a third of the time for three formats less."""
    matplotlib = _matplotlib()
    formats = tuple(formats)
    for fmt in formats:
        if fmt not in FORMATS:
            raise ValueError(f"figure format {fmt!r} is not one of {', '.join(FORMATS)}")
    fig = _figure(model, style)
    files = {}
    with matplotlib.rc_context({"svg.fonttype": "none", "svg.hashsalt": "statsetter", "font.family": "sans-serif",
                                "font.sans-serif": [str(style.figures.get("font", "DejaVu Sans")), "DejaVu Sans"], "mathtext.fontset": "dejavusans",
                                "pdf.fonttype": 42}):
        for fmt in formats:
            out = io.BytesIO()
            fig.savefig(out, format=fmt, dpi=int(style.figures.get("dpi", 300)), metadata=_METADATA[fmt])
            files[fmt] = out.getvalue()
    return files


def write_figure(model: "FigureModel", style: "Style", folder: "str | Path", stem: str, formats: Iterable[str] = FORMATS, *,
                 inputs: Iterable["str | Path"] = ()) -> "FigureModel":
    """Write the figure as ``<stem>.<format>`` files in ``folder`` (atomically, with the other outputs of a run);
    the model with those file names and its PNG bytes, for the documents that show it."""
    from ..files import write_atomic

    folder = Path(folder)
    folder.mkdir(parents=True, exist_ok=True)
    drawn = _drawn(model, style, formats)
    files = {fmt: write_atomic(folder / f"{stem}.{fmt}", data, inputs=inputs).name for fmt, data in drawn.items()}
    return model.with_files(files, drawn.get("png"))
