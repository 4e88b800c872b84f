"""The house plan holds: packages import only from the layers below them, and reading results
loads neither runtimes, sandboxes nor jinja2 (DEVELOPERS.md, "Architecture")."""

from __future__ import annotations

import ast
import subprocess
import sys
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parents[1]
HARNESS = ROOT / "harness"

# Bottom to top; a package may import its own modules and those of any lower layer.
LAYERS = [
    {"vocabulary", "yamlfiles", "locations", "console"},
    {"problems"},
    {"extraction"},
    {"runtimes", "sandbox"},
    {"store"},
    {"metrics"},
    {"engine"},
    {"analysis"},
    {"render"},
    {"cli"},
    {"__main__"},
]
LEVEL = {name: index for index, layer in enumerate(LAYERS) for name in layer}


def top_package(module: str) -> str:
    """``harness.engine.scoring`` -> ``engine``."""
    parts = module.split(".")
    return parts[1] if len(parts) > 1 else "__init__"


def project_imports(file: Path) -> list[tuple[int, str]]:
    """(line, absolute module) of every harness import in ``file``, lazy ones included."""
    module = ".".join(file.relative_to(ROOT).with_suffix("").parts)
    package = module if file.name == "__init__.py" else module.rsplit(".", 1)[0]
    package = package.removesuffix(".__init__")
    found = []
    for node in ast.walk(ast.parse(file.read_text(encoding="utf-8"))):
        if isinstance(node, ast.ImportFrom):
            if node.level:
                base = package.split(".")
                base = base[: len(base) - node.level + 1]
                target = ".".join(base + ([node.module] if node.module else []))
            else:
                target = node.module or ""
            if target == "harness":  # `from .. import x`: a module, or a name of harness/__init__.py
                targets = [f"harness.{alias.name}" if alias.name in LEVEL else "harness" for alias in node.names]
            else:
                targets = [target]
            found += [(node.lineno, t) for t in targets if t.startswith("harness.")]
        elif isinstance(node, ast.Import):
            found += [(node.lineno, alias.name) for alias in node.names if alias.name.startswith("harness.")]
    return found


def test_every_package_has_a_layer():
    packages = {p.stem if p.is_file() else p.name for p in HARNESS.iterdir()
                if (p.suffix == ".py" and p.stem != "__init__") or (p / "__init__.py").is_file()}
    assert packages - set(LEVEL) == set(), "add new packages to LAYERS and to DEVELOPERS.md"


def test_no_import_runs_back_up_the_layers():
    upward = []
    for file in sorted(HARNESS.rglob("*.py")):
        here = top_package(".".join(file.relative_to(ROOT).with_suffix("").parts))
        if here == "__init__":
            continue
        for line, target in project_imports(file):
            there = top_package(target)
            if there == here or there == "__init__":
                continue
            if LEVEL[there] >= LEVEL[here]:
                upward.append(f"{file.relative_to(ROOT)}:{line}: {here} imports {target}")
    assert upward == []


def test_runtimes_and_sandboxes_do_not_know_each_other():
    crossing = [f"{file.relative_to(ROOT)}:{line}: {target}"
                for package, other in (("runtimes", "sandbox"), ("sandbox", "runtimes"))
                for file in sorted((HARNESS / package).rglob("*.py"))
                for line, target in project_imports(file) if top_package(target) == other]
    assert crossing == []


@pytest.mark.parametrize("modules", ["harness.store, harness.analysis", "harness.metrics, harness.problems"])
def test_reading_results_loads_no_runtime_sandbox_or_template_engine(modules):
    code = (f"import sys, {modules}\n"
            "loaded = [m for m in sys.modules if m.startswith(('harness.runtimes', 'harness.sandbox', 'harness.engine',"
            " 'jinja2', 'docker'))]\n"
            "print(loaded)\n"
            "sys.exit(1 if loaded else 0)\n")
    done = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, cwd=ROOT)
    assert done.returncode == 0, done.stdout + done.stderr


def test_every_package_says_what_it_owns():
    for init in sorted(HARNESS.glob("*/__init__.py")):
        doc = ast.get_docstring(ast.parse(init.read_text(encoding="utf-8")))
        assert doc and len(doc.split()) >= 8, f"{init.relative_to(ROOT)} needs a docstring saying what it owns"
