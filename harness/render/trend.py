"""pass@k across checkpoints: a terminal table and a PNG plot (matplotlib, optional)."""

from __future__ import annotations

from pathlib import Path

from ..analysis.report import MARKS, TRUST_MARKS
from .cells import figure_cell
from ..console import paint, render as render_columns


def render_trend(trend: dict, colour: bool = False) -> str:
    s = trend["settings"]
    series = trend["languages"] + [f"{kind} problems" for kind in trend.get("kinds", [])] + ["overall"]
    out = [f"pass@k by checkpoint; cells: estimate [low, high] in percent, {100 * s['confidence']:g}% "
           f"{s['method']} bootstrap over problems, {s['resamples']} resamples, seed {s['seed']}"]
    out += [paint("warning: " + w, "33", colour) for w in trend["warnings"]]
    flagged = False
    for k in s["ks"]:
        body = []
        for point in trend["points"]:
            cells = [str(point["step"]) if point["step"] is not None else "-", point["label"]]
            for name in series:
                row = point["groups"].get(name.removesuffix(" problems"))
                if row is None:
                    cells.append("-")
                    continue
                flag = bool(set(TRUST_MARKS) & set(row["marks"]))
                flagged |= flag
                cells.append(figure_cell(row["pass_at_k"][str(k)], flag))
            body.append(cells)
        out += ["", paint(f"pass@{k}", "1", colour),
                render_columns(["step", "checkpoint"] + series, body, align="rl" + "r" * len(series))]
    if flagged:
        out.append("* " + "; ".join(MARKS[m] for m in ("few_problems", "infra_errors")
                                    if any(m in r["marks"] for p in trend["points"] for r in p["groups"].values())))
    return "\n".join(out)


def plot_trend(trend: dict, path: Path):
    """Write a PNG (one panel per k; a line per language plus overall, shaded intervals; hollow
    markers where a figure is marked untrustworthy). Returns the matplotlib Figure."""
    try:
        from matplotlib.figure import Figure
    except ImportError:
        raise RuntimeError("--plot needs matplotlib: pip install 'assay-harness[plot]'") from None
    ks = trend["settings"]["ks"]
    points = trend["points"]
    numeric = all(p["step"] is not None for p in points)
    xs = [p["step"] for p in points] if numeric else list(range(len(points)))
    figure = Figure(figsize=(5.5 * len(ks), 4.2), layout="constrained")
    axes = figure.subplots(1, len(ks), squeeze=False)[0]
    for ax, k in zip(axes, ks):
        for name in trend["languages"] + trend.get("kinds", []) + ["overall"]:
            series = [(x, p["groups"][name]) for x, p in zip(xs, points) if name in p["groups"]
                      and p["groups"][name]["pass_at_k"][str(k)] is not None]
            if not series:
                continue
            x = [x for x, _ in series]
            figures = [row["pass_at_k"][str(k)] for _, row in series]
            y = [100 * f["estimate"] for f in figures]
            overall = name == "overall"
            (line,) = ax.plot(x, y, marker="o", label=name, linewidth=2.4 if overall else 1.4,
                              color="black" if overall else None, linestyle="--" if overall else "-",
                              zorder=3 if overall else 2)
            ax.fill_between(x, [100 * f["low"] for f in figures], [100 * f["high"] for f in figures],
                            color=line.get_color(), alpha=0.12, linewidth=0)
            shaky = [(xv, yv) for (xv, row), yv in zip(series, y) if set(TRUST_MARKS) & set(row["marks"])]
            if shaky:
                ax.plot([p[0] for p in shaky], [p[1] for p in shaky], linestyle="none", marker="o",
                        markersize=10, markerfacecolor="white", markeredgecolor=line.get_color(), zorder=4)
        ax.set_title(f"pass@{k}")
        ax.set_xlabel("step" if numeric else "checkpoint")
        ax.set_ylabel("percent")
        ax.set_ylim(0, 100)
        ax.grid(alpha=0.3)
        if not numeric:
            ax.set_xticks(xs, [p["label"] for p in points], rotation=20, ha="right")
        ax.legend(loc="lower right", fontsize="small")
    figure.suptitle(f"pass@k by checkpoint ({100 * trend['settings']['confidence']:g}% intervals)")
    Path(path).parent.mkdir(parents=True, exist_ok=True)
    figure.savefig(path, format="png", dpi=100)
    return figure
