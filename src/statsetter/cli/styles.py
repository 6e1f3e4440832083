"""``statsetter styles``: list, show or check style profiles."""

from __future__ import annotations

import argparse

from ..errors import InputError


def add(sub) -> None:  # type: ignore[no-untyped-def]
    s = sub.add_parser("styles", help="list, show or check style profiles")
    s.add_argument("action", nargs="?", choices=("list", "show", "check"), default="list")
    s.add_argument("target", nargs="?", metavar="NAME|FILE", help="style to show, or TOML file to check")
    s.set_defaults(handler=run)


def run(ns: argparse.Namespace) -> int:
    from ..style import builtin_styles, check_style_file, load_style

    if ns.action == "list":
        for name in builtin_styles():
            style = load_style(name)
            print(f"{name:8} {style.title}")
        return 0
    if ns.target is None:
        raise InputError(f"styles {ns.action}: name a {'style' if ns.action == 'show' else 'TOML file'}")
    if ns.action == "show":
        _show_style(load_style(ns.target))
        return 0
    style = check_style_file(ns.target)
    print(f"{ns.target}: valid style {style.name!r} ({style.title})")
    return 0


def _show_style(style) -> None:  # type: ignore[no-untyped-def]
    from ..rendering.sentences import render
    from ..records import EffectSize, Interval, Result, Statistic

    print(f"{style.name}: {style.title}")
    print(f"  source: {style.source}")
    for section in ("numbers", "p", "ci", "wording"):
        for key, value in style.data[section].items():
            shown = ", ".join(value) if isinstance(value, tuple) and value and isinstance(value[0], str) else value
            if isinstance(shown, dict) or hasattr(shown, "items"):
                shown = ", ".join(f"{k}={v}" for k, v in shown.items())
            print(f"  {section}.{key} = {shown!r}" if isinstance(shown, str) else f"  {section}.{key} = {shown}")
    sample = Result(
        kind="t_independent",
        statistic=Statistic("t", -2.1436, (38,)),
        p=0.03855,
        effects=(EffectSize("d", -0.6779, Interval(0.95, -1.3127, -0.0346)),),
    )
    print("  example: " + render(sample, "stats", style).plain())
