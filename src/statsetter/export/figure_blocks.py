"""A FigureModel placed in a document, with its number, title and note:
Markdown (an image link with the caption as text), HTML (``<figure>`` and
``<figcaption>``), LaTeX (``\\includegraphics`` in a figure environment) and
Word (the picture at the column width with its alt text, the caption
paragraphs kept with it). APA 7 puts "Figure 1" in bold and the title in
italic title case above the image and the note below; AMA 11 writes
"Figure 1. Title" on one line (the style's ``[figures] caption``)."""

from __future__ import annotations

import html
from pathlib import Path
from typing import TYPE_CHECKING

from ..styled import StyledText

if TYPE_CHECKING:
    from docx.document import Document

    from ..rendering.figures import FigureModel
    from ..style.profile import Style

__all__ = ["add_figure", "figure_parts", "figure_text"]


def _one_line(style: "Style") -> bool:
    return style.figures.get("caption", "two_lines") == "one_line"


def _label(model: "FigureModel", one_line: bool) -> str:
    return f"Figure {model.number if model.number is not None else ''}".rstrip() + ("." if one_line else "")


def figure_text(model: "FigureModel", fmt: str, style: "Style") -> str:
    """The figure as Markdown (``md``), HTML (``html``) or LaTeX (``tex``); the image is ``model.files`` (png, or pdf for LaTeX)."""
    one = _one_line(style)
    label = _label(model, one)
    title = model.title
    if fmt == "md":
        image = model.files.get("png") or model.files.get("svg", "")
        alt = model.alt.replace("]", ")").replace("[", "(")
        caption = f"**{label}** {title.to('md')}" if one else f"**{label}**\n\n*{title.to('md').strip('*')}*"
        return f"{caption}\n\n![{alt}]({image})\n\n{model.note.to('md')}"
    if fmt == "html":
        image = model.files.get("svg") or model.files.get("png", "")
        head = (f"<b>{html.escape(label)}</b> {title.to('html')}" if one else
                f"<b>{html.escape(label)}</b><br><i>{title.to('html')}</i>")
        return (f'<figure class="statsetter-figure"><figcaption>{head}</figcaption>'
                f'<img src="{html.escape(image)}" alt="{html.escape(model.alt)}" style="max-width:100%">'
                f"<p>{model.note.to('html')}</p></figure>")
    if fmt == "tex":
        image = model.files.get("pdf") or model.files.get("png", "")
        head = (f"\\textbf{{{label}}} {title.to('tex')}" if one else f"\\textbf{{{label}}}\\par\\smallskip\n\\textit{{{title.to('tex')}}}")
        return ("\\begin{figure}[htbp]\n\\raggedright\n" + head + "\\par\\medskip\n"
                + f"\\includegraphics[width=\\linewidth]{{{image}}}\\par\\medskip\n" + model.note.to("tex") + "\n\\end{figure}")
    raise ValueError(f"unknown figure format {fmt!r}")


def figure_parts(document: "Document", model: "FigureModel", style: "Style", png: "bytes | str | Path | None" = None,
                 width: int | None = None) -> list:  # type: ignore[type-arg]
    """The figure as Word XML in order: its caption kept with the picture, the picture paragraph (the image at
    ``width`` twips, the text width by default; alt text in ``descr``: the title and a one-line description), the note."""
    import io

    from docx.oxml import OxmlElement, parse_xml

    from .docx_writer import _paragraph_xml, caption_xml, text_width_of

    if png is None:
        from .figure_files import draw

        png = draw(model, style, "png")
    source = io.BytesIO(png) if isinstance(png, bytes) else str(png)
    inline = document.part.new_pic_inline(source, (width or text_width_of(document)) * 635, None)  # twips to EMU
    inline.docPr.set("descr", f"{model.title.plain()}. {model.alt}")
    inline.docPr.set("title", model.title.plain())
    picture = parse_xml(_paragraph_xml(StyledText(""), keep_next=True))
    run, drawing = OxmlElement("w:r"), OxmlElement("w:drawing")
    drawing.append(inline)
    run.append(drawing)
    picture.append(run)
    return [*caption_xml("Figure", model.number, model.title, _one_line(style)), picture, _paragraph_xml(model.note)]


def add_figure(document: "Document", model: "FigureModel", style: "Style", png: "bytes | str | Path | None" = None) -> None:
    """The figure at the end of ``document`` (see `figure_parts`)."""
    from docx.oxml import parse_xml

    body = document.element.body
    end = body.sectPr
    for part in figure_parts(document, model, style, png):
        element = parse_xml(part) if isinstance(part, str) else part
        if end is not None:
            end.addprevious(element)
        else:
            body.append(element)
