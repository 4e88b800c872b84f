"""Runtimes: one folder per language, holding ``runtime.yaml`` and jinja2 templates.

The engine knows nothing about any language. A runtime says how to name things, how to render
a prompt and a program (prompt + completion + test driver), which commands compile and run it,
where a continuation should stop, and what its sandbox must expose.
"""

from __future__ import annotations

import hashlib
import json
import secrets
import shutil
import subprocess
from dataclasses import dataclass, field
from functools import cached_property
from pathlib import Path

import jinja2
import jinja2.meta

from ..extraction import ExtractionSpec, ExtractionSpecError, parse_extraction_spec
from ..locations import runtime_search_path
from ..problems import Problem
from ..problems.types import GENERICS, SCALARS
from ..vocabulary import STEP_DEFAULTS, LimitOverrides, Limits, RuntimeSandboxNeeds, WarmFiles
from ..yamlfiles import read_yaml
from .filters import (NAMING_STYLES, chunked, float_class, float_literal, indent_lines, recase,
                      utf16_units)

RUNTIME_FILE = "runtime.yaml"
# The one template a runtime needs for whole-program problems: the continue-mode prompt (the
# statement as a comment, then the language's usual start of a program).
PROGRAM_TEMPLATE = "program_main.j2"
# Toolchains are looked up on the PATH the sandbox sees, not the invoking user's.
SANDBOX_PATH = "/usr/local/bin:/usr/bin:/bin"


class RuntimeConfigError(ValueError):
    """A runtime folder that is missing or malformed; the message names file and field."""


@dataclass(frozen=True)
class WarmCompile:
    """How a compile step may skip a cold compiler start (``compile.warm`` in runtime.yaml):
    ``server``, a long-lived compiler process started with ``command`` in a sandbox of its own,
    fed the cold ``compile.command`` and the source (``files``, a folder of the runtime, is bound
    read-only where ``{files}`` stands in ``command``); or ``prepared``, the runtime's ``file``
    turned once per toolchain by ``build`` into files (a precompiled header, an index of the
    precompiled standard library) that ``command`` reads (``{file}`` stands for its path).
    ``harness/sandbox/warm_compilers.py`` runs them; every verdict must equal the cold command's."""

    kind: str
    command: tuple[str, ...]
    files: str | None = None
    file: str | None = None
    build: tuple[str, ...] = ()


@dataclass(frozen=True)
class Step:
    """A compile or run step: the command (list of argv strings) and its limit overrides."""

    command: tuple[str, ...]
    limits: LimitOverrides = field(default_factory=LimitOverrides)
    warm: WarmCompile | None = None


@dataclass(frozen=True)
class ProgramSetup:
    """How a runtime builds and runs a whole program (problems of kind ``program``): runtime.yaml's
    ``program:`` section, each field defaulting to the function kind's; ``stop_sequences`` end a
    continuation of the program prompt."""

    source_file: str
    compile: Step | None
    run: Step
    stop_sequences: tuple[str, ...] = ()


def _stand_in(length: int) -> str:
    """A random stand-in for a nonce or a results file's name: hexadecimal digits, as many as
    the real one's characters, which no template filter escapes or splits differently."""
    return secrets.token_hex((length + 1) // 2)[:length]


@dataclass
class _Frame:
    """A problem's program rendered with stand-ins for the code, the results file's name and the
    nonce (Runtime.render_program): the text before and after the code. ``checked`` once a
    filled-in program equalled a full rendering."""

    problem: Problem
    head: str
    tail: str
    results_file: str
    nonce: str
    checked: bool = False

    def fill(self, code: str, results_file: str, nonce: str) -> str:
        def put(text: str) -> str:
            return text.replace(self.results_file, results_file).replace(self.nonce, nonce)

        return put(self.head) + code + put(self.tail)


@dataclass
class Runtime:
    name: str
    path: Path
    display_name: str
    source_file: str
    compile: Step | None
    run: Step
    stop_sequences: tuple[str, ...]
    naming: dict[str, str]
    needs: RuntimeSandboxNeeds
    version_command: tuple[str, ...]
    limits: LimitOverrides
    error_patterns: dict[str, tuple[str, ...]]
    reference_indent: str = ""
    reserved_words: frozenset[str] = frozenset()
    reserved_rename: str = "{name}_"
    unsupported_types: dict[str, str] = field(default_factory=dict)
    extraction: ExtractionSpec | None = None
    program: ProgramSetup | None = None
    # Per (problem id, name and nonce lengths): its program rendered with stand-ins (render_program).
    _frames: dict = field(default_factory=dict, init=False, repr=False, compare=False)

    @cached_property
    def templates(self) -> jinja2.Environment:
        env = jinja2.Environment(
            loader=jinja2.FileSystemLoader(str(self.path)),
            undefined=jinja2.StrictUndefined,
            keep_trailing_newline=True,
            trim_blocks=True,
            lstrip_blocks=True,
            autoescape=False,
        )
        env.filters.update(
            json=lambda v: json.dumps(v, ensure_ascii=False),
            json_ascii=lambda v: json.dumps(v, ensure_ascii=True),
            float_literal=float_literal,
            snake=lambda s: recase(s, "snake"),
            camel=lambda s: recase(s, "camel"),
            pascal=lambda s: recase(s, "pascal"),
            indent_lines=indent_lines,
            float_class=float_class,
            chunked=chunked,
            utf16_units=utf16_units,
        )
        env.globals["INT64_MIN"] = -(2**63)
        return env

    @property
    def digest(self) -> str:
        """Content hash of the runtime folder: it identifies exactly what rendered a program."""
        return self.needs.digest

    def name_of(self, kind: str, snake_name: str) -> str:
        """A problem's snake_case name in this language's convention; a name that is a reserved
        word here gets the runtime's ``reserved_rename`` pattern (``end`` -> ``end_``)."""
        name = recase(snake_name, self.naming.get(kind, "snake"))
        return self.reserved_rename.format(name=name) if name in self.reserved_words else name

    def renamed(self, problem: Problem) -> list[tuple[str, str]]:
        """The (problem name, name in this language) pairs that reserved words forced apart."""
        if problem.kind == "program":
            return []
        names = [("function", problem.function)] + [("param", p.name) for p in problem.params]
        return [(snake, self.name_of(kind, snake)) for kind, snake in names
                if recase(snake, self.naming.get(kind, "snake")) in self.reserved_words]

    def refusal(self, problem: Problem) -> str | None:
        """Why this runtime cannot pose ``problem`` (a declared type it has no counterpart
        for, or no template for whole programs), or None when it can."""
        if problem.kind == "program":
            if not (self.path / PROGRAM_TEMPLATE).is_file():
                return f"{self.name} has no {PROGRAM_TEMPLATE} template: it cannot pose whole-program problems ({problem.id})"
            return None
        declared = [(f"parameter {p.name}", p.type) for p in problem.params] + [("the result", problem.returns)]
        for where, typ in declared:
            for part in typ.walk():
                if part.kind in self.unsupported_types:
                    return (f"{self.name} cannot represent {part.kind} (declared by {where} of {problem.id}):"
                            f" {self.unsupported_types[part.kind]}")
        return None

    def context(self, problem: Problem) -> dict:
        if problem.kind == "program":
            return self.program_context(problem)
        return {
            "problem": problem,
            "function": self.name_of("function", problem.function),
            "params": [
                {"name": self.name_of("param", p.name), "type": p.type, "source_name": p.name}
                for p in problem.params
            ],
            "returns": problem.returns,
            "examples": problem.examples,
            "description_lines": problem.description.splitlines(),
            "candidate_imports": "",
            "candidate_types": "",
        }

    def program_context(self, problem) -> dict:
        """What ``program_main.j2`` sees: the statement's lines and the example cases' lines."""
        examples = []
        for case in problem.examples:
            given, expected = case.texts()
            examples.append({"input_lines": given.splitlines(), "output_lines": expected.splitlines()})
        return {"problem": problem, "title": problem.title, "description_lines": problem.description.splitlines(),
                "examples": examples}

    def reference(self, problem: Problem) -> str | None:
        """The problem's reference in this language: from the problem set (its YAML or its
        ``references/<language>/`` folder), else from this runtime's own folder,
        ``references/<set folder>/<problem id>.<ext>``, so a runtime kept anywhere can carry the
        references of the sets it must pass (the conformance set above all)."""
        if self.name in problem.reference:
            return problem.reference[self.name]
        folder = self.path / "references" / problem.source.parent.name
        found = sorted(folder.glob(f"{problem.id}.*")) if folder.is_dir() else []
        return found[0].read_text(encoding="utf-8") if found else None

    def reference_completion(self, problem: Problem) -> str:
        """The problem's reference as a continuation of this runtime's prompt (a whole program's
        reference is the program itself: it is judged in whole mode)."""
        if problem.kind == "program":
            text = self.reference(problem)
            return text if text.endswith("\n") else text + "\n"
        return indent_lines(self.reference(problem), self.reference_indent) + "\n"

    def render_prompt(self, problem: Problem) -> str:
        if problem.kind == "program":
            return self.templates.get_template(PROGRAM_TEMPLATE).render(self.program_context(problem))
        return self.templates.get_template("prompt.j2").render(self.context(problem))

    def render_preamble(self, problem: Problem, candidate_imports: str = "", candidate_types: str = "") -> str:
        """What precedes a whole-function completion (imports, an enclosing class opener).
        ``candidate_imports`` and ``candidate_types`` are what extraction kept of the model's
        imports and of its top-level types; a template that names them places them where its
        language requires, and :meth:`assemble_whole` puts them first for one that does not.
        A whole program has none: it is the program as the model wrote it."""
        if problem.kind == "program":
            return ""
        try:
            template = self.templates.get_template("preamble.j2")
        except jinja2.TemplateNotFound:
            return ""
        context = self.context(problem)
        context.update(candidate_imports=candidate_imports, candidate_types=candidate_types)
        return template.render(context)

    @cached_property
    def preamble_places(self) -> frozenset[str]:
        """Which of ``candidate_imports``/``candidate_types`` the preamble template places."""
        try:
            source = self.templates.loader.get_source(self.templates, "preamble.j2")[0]
        except jinja2.TemplateNotFound:
            return frozenset()
        names = jinja2.meta.find_undeclared_variables(self.templates.parse(source))
        return frozenset(names & {"candidate_imports", "candidate_types"})

    def assemble_whole(self, problem: Problem, code: str, imports: str = "", types: str = "") -> str:
        """The candidate's source in whole mode: preamble, then the model's selected code, with
        its imports and top-level types where the language requires them."""
        places = self.preamble_places
        preamble = self.render_preamble(problem, imports if "candidate_imports" in places else "",
                                        types if "candidate_types" in places else "")
        head = "".join(part + "\n\n" for part in (
            imports if "candidate_imports" not in places else "",
            types if "candidate_types" not in places else "") if part)
        return head + preamble + code

    def render_program(self, problem: Problem, code: str, results_file: str, nonce: str) -> str:
        """The full source to run: the candidate's code followed by the generated test driver.

        Rendering the driver's cases is most of a candidate's rendering time (milliseconds, for
        every candidate), and it depends only on the problem, the nonce and the results file's
        name. So where program.j2 uses the code as it is (``{{ code }}``, once, and nowhere else),
        a problem's program is rendered once with stand-ins of the same length and characters
        for the three, and each candidate's is filled in. The first filled-in program of every
        problem is checked against a full rendering; a runtime whose templates treat the nonce
        or the name otherwise is rendered in full from then on."""
        code = self._candidate_source(problem, code)
        frame = self._frame(problem, len(results_file), len(nonce)) if self._code_is_verbatim else None
        if frame is None:
            return self._render_program(problem, code, results_file, nonce)
        filled = frame.fill(code, results_file, nonce)
        if not frame.checked:
            if filled != self._render_program(problem, code, results_file, nonce):
                self._code_is_verbatim = False  # this runtime's templates are rendered in full
                return self._render_program(problem, code, results_file, nonce)
            frame.checked = True
        return filled

    def _candidate_source(self, problem: Problem, code: str) -> str:
        """The code as the program starts with it: source.j2's rendering where the runtime has
        one (a template that must look at the code, kept apart so that program.j2 can use it
        verbatim), else the code itself."""
        if not self._has_source_template:
            return code
        context = self.context(problem)
        context.update(code=code)
        return self.templates.get_template("source.j2").render(context)

    @cached_property
    def _has_source_template(self) -> bool:
        return (self.path / "source.j2").is_file()

    def _render_program(self, problem: Problem, code: str, results_file: str, nonce: str) -> str:
        context = self.context(problem)
        context.update(code=code, cases=problem.cases, results_file=results_file, nonce=nonce)
        return self.templates.get_template("program.j2").render(context)

    def _frame(self, problem: Problem, results_length: int, nonce_length: int) -> _Frame | None:
        """``problem``'s program around a stand-in for the code, or None where it cannot be split."""
        key = (problem.id, results_length, nonce_length)
        found = self._frames.get(key)
        if found is None or found.problem is not problem:
            code, results_file, nonce = (f"assay-code-{secrets.token_hex(16)}", _stand_in(results_length),
                                         _stand_in(nonce_length))
            parts = self._render_program(problem, code, results_file, nonce).split(code)
            if len(parts) != 2:
                return None
            found = self._frames[key] = _Frame(problem, parts[0], parts[1], results_file, nonce)
        return found

    @cached_property
    def _code_is_verbatim(self) -> bool:
        """Whether program.j2 names ``code`` once, as ``{{ code }}``, and includes no other
        template (which would see it too)."""
        try:
            source = self.templates.loader.get_source(self.templates, "program.j2")[0]
            tokens = [(kind, value) for _, kind, value in self.templates.lex(source)
                      if kind not in ("whitespace", "data")]
        except jinja2.TemplateError:
            return False
        uses = [i for i, token in enumerate(tokens) if token == ("name", "code")]
        if any(token in (("name", "include"), ("name", "extends")) for token in tokens) or len(uses) != 1:
            return False
        i = uses[0]
        return tokens[i - 1][0] == "variable_begin" and tokens[i + 1][0] == "variable_end"

    def step_limits(self, kind: str, problem: LimitOverrides = LimitOverrides(),
                    command_line: LimitOverrides = LimitOverrides(), program: bool = False) -> Limits | None:
        """The limits of this runtime's ``compile`` or ``run`` step (None: no such step).

        The one place where layers meet, each overriding the ones before it: the engine's
        ``STEP_DEFAULTS[kind]`` < runtime.yaml's ``limits`` < the step's own ``limits`` < the
        problem's ``limits`` (run step only) < the command line (``--timeout``, ``--memory``).
        With ``program``, the steps are those of whole programs (``program:`` in runtime.yaml).
        """
        steps = self.program if program else self
        step = steps.compile if kind == "compile" else steps.run
        if step is None:
            return None
        layers = self.limits.then(step.limits)
        if kind == "run":
            layers = layers.then(problem)
        return STEP_DEFAULTS[kind].merged(layers.then(command_line))

    def toolchain_version(self) -> str | None:
        """The host toolchain's version line, or None when it is not installed."""
        path = dict(self.needs.env).get("PATH", SANDBOX_PATH)
        if not self.version_command or shutil.which(self.version_command[0], path=path) is None:
            return None
        try:
            done = subprocess.run(list(self.version_command), capture_output=True, text=True, timeout=30,
                                  env={"PATH": path, "LANG": "C.UTF-8"})
        except (OSError, subprocess.TimeoutExpired):
            return None
        text = (done.stdout or done.stderr).strip().splitlines()
        return text[0] if text else None


def find_runtime_dir(name: str, extra: list[Path] | None = None) -> Path:
    for root in runtime_search_path(extra):
        candidate = root / name
        if (candidate / RUNTIME_FILE).is_file():
            return candidate
    raise RuntimeConfigError(
        f"unknown runtime {name!r}; known: {', '.join(available_runtimes(extra)) or 'none'}"
        " (add folders with --runtimes-dir or ASSAY_RUNTIMES_PATH)"
    )


def available_runtimes(extra: list[Path] | None = None) -> list[str]:
    names: dict[str, None] = {}
    for root in runtime_search_path(extra):
        if root.is_dir():
            for child in sorted(root.iterdir()):
                if (child / RUNTIME_FILE).is_file():
                    names.setdefault(child.name, None)
    return sorted(names)


def load_runtime(name: str, extra: list[Path] | None = None) -> Runtime:
    return load_runtime_folder(find_runtime_dir(name, extra))


def load_runtime_folder(path: Path) -> Runtime:
    file = path / RUNTIME_FILE
    if not file.is_file():
        raise RuntimeConfigError(f"{file}: missing (not a runtime folder)")
    return parse_runtime(read_yaml(file, RuntimeConfigError), path, file)


def parse_runtime(data: object, path: Path, file: Path) -> Runtime:
    def fail(field_name: str, message: str) -> RuntimeConfigError:
        return RuntimeConfigError(f"{file}: field '{field_name}': {message}")

    if not isinstance(data, dict):
        raise RuntimeConfigError(f"{file}: expected a mapping at the top level")
    if data.get("name", path.name) != path.name:
        raise fail("name", f"must equal the folder name {path.name!r}")

    def step(key: str) -> Step | None:
        raw = data.get(key)
        if raw is None:
            return None
        if not isinstance(raw, dict) or not _str_list(raw.get("command")):
            raise fail(key, "expected a mapping with 'command': a list of strings")
        warm = _warm_compile(raw.get("warm"), path, lambda f, m: fail(f"{key}.warm{f}", m)) if key == "compile" else None
        return Step(tuple(raw["command"]), _limits(raw.get("limits"), lambda m: fail(f"{key}.limits", m)), warm)

    run = step("run")
    if run is None:
        raise fail("run", "missing")
    source_file = data.get("source_file")
    if not isinstance(source_file, str) or "/" in source_file:
        raise fail("source_file", "expected a plain file name such as main.py")
    for template in ("prompt.j2", "program.j2"):
        if not (path / template).is_file():
            raise RuntimeConfigError(f"{path}: template {template} is missing")
    naming = data.get("naming", {}) or {}
    for kind, style in naming.items():
        if style not in NAMING_STYLES:
            raise fail(f"naming.{kind}", f"{style!r} is not one of {', '.join(NAMING_STYLES)}")
    stops = data.get("stop_sequences", [])
    if not _str_list(stops, allow_empty=True):
        raise fail("stop_sequences", "expected a list of strings")
    sandbox = data.get("sandbox", {}) or {}
    ro_binds = sandbox.get("ro_binds", [])
    if not _str_list(ro_binds, allow_empty=True):
        raise fail("sandbox.ro_binds", "expected a list of absolute paths")
    env = sandbox.get("env", {}) or {}
    if not isinstance(env, dict):
        raise fail("sandbox.env", "expected a mapping of names to values")
    limits = _limits(data.get("limits"), lambda m: fail("limits", m))
    patterns = data.get("error_patterns", {}) or {}
    if not isinstance(patterns, dict) or not all(_str_list(v, allow_empty=True) for v in patterns.values()):
        raise fail("error_patterns", "expected a mapping of outcome to a list of strings")
    version = data.get("version_command", [])
    reserved = data.get("reserved_words", [])
    if not _str_list(reserved, allow_empty=True):
        raise fail("reserved_words", "expected a list of strings")
    rename = data.get("reserved_rename", "{name}_")
    if not isinstance(rename, str) or "{name}" not in rename or rename == "{name}":
        raise fail("reserved_rename", "expected a pattern containing {name}, such as '{name}_'")
    try:
        rename.format(name="x")
    except (KeyError, IndexError, ValueError) as exc:
        raise fail("reserved_rename", f"not a valid pattern: {exc}") from None
    unsupported = data.get("unsupported_types", {}) or {}
    if not isinstance(unsupported, dict) or not all(isinstance(k, str) and isinstance(v, str)
                                                    for k, v in unsupported.items()):
        raise fail("unsupported_types", "expected a mapping of type name to the reason it is refused")
    unknown = set(unsupported) - set(SCALARS) - set(GENERICS)
    if unknown:
        raise fail("unsupported_types", f"unknown type name(s) {', '.join(sorted(unknown))}")
    extraction = None
    if data.get("extraction") is not None:
        try:
            extraction = parse_extraction_spec(data["extraction"])
        except ExtractionSpecError as exc:
            raise fail("extraction", str(exc)) from None
    return Runtime(
        name=path.name,
        path=path,
        display_name=str(data.get("display_name", path.name)),
        source_file=source_file,
        compile=step("compile"),
        run=run,
        stop_sequences=tuple(stops),
        naming=dict(naming),
        needs=RuntimeSandboxNeeds(
            name=path.name,
            ro_binds=tuple(ro_binds),
            env=tuple((str(k), str(v)) for k, v in env.items()),
            image=sandbox.get("image"),
            folder=str(path),
            digest=folder_digest(path),
            warm_files=_warm_files(step("compile")),
        ),
        version_command=tuple(version) if _str_list(version, allow_empty=True) else (),
        limits=limits,
        error_patterns={k: tuple(v) for k, v in patterns.items()},
        reference_indent=str(data.get("reference_indent", "")),
        reserved_words=frozenset(reserved),
        reserved_rename=rename,
        unsupported_types=dict(unsupported),
        extraction=extraction,
        program=_program_setup(data.get("program"), source_file, step("compile"), run,
                               lambda f, m: fail("program" + f, m)),
    )


def _str_list(value: object, allow_empty: bool = False) -> bool:
    return isinstance(value, list) and (allow_empty or value) and all(isinstance(v, str) for v in value)


def _warm_compile(raw: object, folder: Path, fail) -> WarmCompile | None:
    """``compile.warm``: one of ``server: {command, files}`` or ``prepared: {file, build,
    command}`` (docs/runtime-format.md)."""
    if raw is None:
        return None
    if not isinstance(raw, dict) or len(raw) != 1 or next(iter(raw)) not in ("server", "prepared"):
        raise fail("", "expected a mapping with one key, 'server' or 'prepared'")
    kind, spec = next(iter(raw.items()))
    if not isinstance(spec, dict) or not _str_list(spec.get("command")):
        raise fail(f".{kind}.command", "expected a list of strings")
    known = {"server": {"command", "files"}, "prepared": {"command", "file", "build"}}[kind]
    if set(spec) - known:
        raise fail(f".{kind}", f"unknown field(s) {', '.join(sorted(set(spec) - known))}")
    for name in known - {"command", "build"}:
        value = spec.get(name)
        if not isinstance(value, str) or not value or value.startswith("/") or ".." in Path(value).parts:
            raise fail(f".{kind}.{name}", "expected a path inside the runtime folder")
        if not (folder / value).exists():
            raise fail(f".{kind}.{name}", f"{folder / value} does not exist")
    if kind == "prepared" and not _str_list(spec.get("build")):
        raise fail(f".{kind}.build", "expected a list of strings")
    return WarmCompile(kind, tuple(spec["command"]), spec.get("files"), spec.get("file"),
                       tuple(spec.get("build") or ()))


def _warm_files(compile_step: Step | None) -> WarmFiles | None:
    """What of ``compile.warm`` a Docker image carries (harness/sandbox/images.py builds it in)."""
    warm = compile_step.warm if compile_step is not None else None
    if warm is None:
        return None
    return WarmFiles(warm.kind, (warm.files if warm.kind == "server" else warm.file) or "", warm.build)


def _program_setup(raw: object, source_file: str, compile_step: Step | None, run: Step, fail) -> ProgramSetup:
    """runtime.yaml's ``program:`` section (see docs/runtime-format.md); what it leaves out is the
    function kind's. ``compile: null`` means a whole program has no compile step."""
    if raw is None:
        return ProgramSetup(source_file, compile_step, run)
    if not isinstance(raw, dict):
        raise fail("", "expected a mapping with source_file, compile, run and/or stop_sequences")
    unknown = set(raw) - {"source_file", "compile", "run", "stop_sequences"}
    if unknown:
        raise fail("", f"unknown field(s) {', '.join(sorted(map(str, unknown)))}")
    source = raw.get("source_file", source_file)
    if not isinstance(source, str) or not source or "/" in source:
        raise fail(".source_file", "expected a plain file name such as Main.java")

    def program_step(key: str, default: Step | None) -> Step | None:
        if key not in raw:
            return default
        value = raw[key]
        if value is None and key == "compile":
            return None
        if not isinstance(value, dict) or not _str_list(value.get("command")):
            raise fail(f".{key}", "expected a mapping with 'command': a list of strings")
        return Step(tuple(value["command"]), _limits(value.get("limits"), lambda m: fail(f".{key}.limits", m)))

    stops = raw.get("stop_sequences", [])
    if not _str_list(stops, allow_empty=True):
        raise fail(".stop_sequences", "expected a list of strings")
    return ProgramSetup(source, program_step("compile", compile_step), program_step("run", run), tuple(stops))


def _limits(raw: object, fail) -> LimitOverrides:
    try:
        return LimitOverrides.parse(raw)
    except ValueError as exc:
        raise fail(str(exc)) from None


def folder_digest(path: Path) -> str:
    """Content hash of a folder's files (names and bytes)."""
    hasher = hashlib.sha256()
    for file in sorted(p for p in path.rglob("*") if p.is_file()):
        hasher.update(str(file.relative_to(path)).encode() + b"\0" + file.read_bytes() + b"\0")
    return hasher.hexdigest()
