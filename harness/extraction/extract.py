"""Selecting the program a model meant from what it wrote.

Two policies: ``syntax`` (the default) reads the answer with the runtime's grammar; ``strict``
keeps the old, purely textual rules (first fenced block; stop sequences). Either way the
result is a selection of the model's own text: nothing is rewritten.

The record returned with every extraction says how the program was obtained, so that a
surprising verdict can be traced to the text the model wrote.
"""

from __future__ import annotations

import re
from dataclasses import dataclass, field
from functools import lru_cache

from .fences import Block, fenced_blocks
from .spec import ExtractionSpec
from .syntax import GrammarMissing, ParseBudgetExceeded, Item, functions_named, item_of, items_of, parameter_range, parse

POLICY_VERSION = 1
EXTRACTION_POLICIES = ("syntax", "strict")
_FIRST_FENCE = re.compile(r"```[^\n`]*\n(.*?)(?:\n```|\Z)", re.DOTALL)


def policy_label(policy: str) -> str:
    """How manifests name a policy: ``syntax/1``. A new version changes what programs run."""
    return f"{policy}/{POLICY_VERSION}"


@dataclass(frozen=True)
class ExtractionRequest:
    """What one extraction needs: the model's text and where it goes."""

    mode: str  # continue | whole
    completion: str
    prompt: str
    preamble: str
    function: str  # the target's name in this language
    param_count: int
    stops: tuple[str, ...]
    spec: ExtractionSpec | None
    policy: str = "syntax"
    kind: str = "function"  # function | program (a whole program: kept whole, main included)


@dataclass
class Extraction:
    """``code`` follows the preamble (whole) or is the whole candidate (continue). In whole
    mode ``imports`` and ``types`` are kept apart so the runtime can put them where its language
    requires (before a class the template opens, say)."""

    code: str
    imports: str = ""
    types: str = ""
    record: dict = field(default_factory=dict)


def extract(request: ExtractionRequest) -> Extraction:
    if request.policy not in EXTRACTION_POLICIES:
        raise ValueError(f"unknown extraction policy {request.policy!r}; choose one of: "
                         f"{', '.join(EXTRACTION_POLICIES)}")
    if request.policy == "strict" or request.spec is None:
        why = "strict policy" if request.policy == "strict" else "the runtime declares no grammar"
        return _textual(request, why)
    try:
        if request.kind == "program":
            return _program(request)
        if request.mode == "continue":
            return _continue(request)
        return _whole(request)
    except (GrammarMissing, ParseBudgetExceeded) as exc:
        return _textual(request, str(exc))
    except RecursionError:
        return _textual(request, "the text nests too deeply to parse")
    except Exception as exc:  # a selection bug must cost one sample the old rules, never the run
        return _textual(request, f"extraction failed ({type(exc).__name__}: {exc}); used the textual rules")


def _textual(request: ExtractionRequest, why: str) -> Extraction:
    """The old rules: first fenced block (whole), earliest stop sequence (continue)."""
    if request.mode == "continue":
        kept = truncate_at_stops(request.completion, request.stops)
        record = {"method": "stop_sequences", "why": why}
        if len(kept) < len(request.completion):
            record["dropped"] = [f"{len(request.completion) - len(kept)} characters after a stop sequence"]
        return Extraction(request.prompt + kept, record=record)
    match = _FIRST_FENCE.search(request.completion)
    record = {"method": "first_block" if match else "whole_text", "why": why}
    return Extraction(match.group(1) if match else request.completion, record=record)


def truncate_at_stops(completion: str, stops) -> str:
    """Cut a continuation at the earliest stop sequence (the generator may not have)."""
    cut = len(completion)
    for stop in stops:
        index = completion.find(stop)
        if index != -1:
            cut = min(cut, index)
    return completion[:cut]


# --- whole mode -----------------------------------------------------------------------------

@dataclass
class _Reading:
    """One candidate source (a fenced block or the whole text) read with the grammar."""

    where: str
    source: bytes
    items: list[Item]
    target: Item | None
    exact: bool
    tagged: bool


def _whole(request: ExtractionRequest) -> Extraction:
    spec = request.spec
    blocks = fenced_blocks(request.completion)
    readings = [_read(request, block.text, f"block {n} of {len(blocks)}" + (f" ({block.tag})" if block.tag else ""),
                      _tag_matches(spec, block))
                for n, block in enumerate(blocks, start=1)]
    found = [r for r in readings if r.target is not None]
    if not found:
        found = _unfenced(request)
    if not found:
        fallback = _textual(request, f"no block defines {request.function}")
        fallback.record["policy"] = policy_label("syntax")
        return fallback
    # Exact parameter count beats a name match; a function beats a same-named definition that
    # declares no parameters (`const f = require("./f")` in a block of tests); a tagged block
    # beats an untagged one; among equals the last wins (a model's revised version follows its
    # first attempt).
    best = max(enumerate(found), key=lambda pair: (pair[1].exact, _callable(spec, pair[1].target),
                                                   pair[1].tagged, pair[0]))[1]
    return _select(request, best)


def _callable(spec: ExtractionSpec, target: Item) -> bool:
    return target.kind == "function" or parameter_range(spec, target.inner) is not None


MAX_PROSE_PARAGRAPHS = 6
_BLANK_LINES = re.compile(r"\n(?:[ \t]*\n)+")


def _unfenced(request: ExtractionRequest) -> list[_Reading]:
    """No fenced block defines the target: the whole text, else the text after its first few
    paragraphs (a sentence before the code can swallow it: `function` in "The function below"
    is a keyword, the apostrophe in "Here's" opens a string)."""
    text, start = request.completion, 0
    for _ in range(MAX_PROSE_PARAGRAPHS + 1):
        where = "the whole text" if start == 0 else f"the text from line {text.count(chr(10), 0, start) + 1}"
        reading = _read(request, text[start:], where, False)
        if reading.target is not None:
            return [reading]
        gap = _BLANK_LINES.search(text, start)
        if gap is None:
            return []
        start = gap.end()
    return []


def _tag_matches(spec: ExtractionSpec, block: Block) -> bool:
    return not block.tag or block.tag in spec.tags


def _read(request: ExtractionRequest, text: str, where: str, tagged: bool) -> _Reading:
    spec = request.spec
    source = text.encode("utf-8", "surrogatepass")
    root = parse(spec, source).root_node
    items = items_of(spec, source, root)
    target, exact = _target(request, items)
    if target is None:
        # The function may sit inside a class the runtime's template supplies itself.
        items, target, exact = _unwrap(request, source, items)
    return _Reading(where, source, items, target, exact, tagged)


MAX_WRAPPERS = 3


def _unwrap(request: ExtractionRequest, source: bytes, items: list[Item],
            depth: int = 1) -> tuple[list[Item], Item | None, bool]:
    """Replace the wrapper that holds the target by its members; wrappers nest (a class in a
    namespace), up to MAX_WRAPPERS deep."""
    spec = request.spec
    for wrapper in [i for i in items if i.inner.type in spec.wrappers]:
        body = wrapper.inner.child_by_field_name(spec.wrappers[wrapper.inner.type])
        members = items_of(spec, source, body, wrapped=True) if body is not None else []
        found, found_exact = _target(request, members)
        if found is None and depth < MAX_WRAPPERS:
            members, found, found_exact = _unwrap(request, source, members, depth + 1)
        if found is not None:
            index = items.index(wrapper)
            return (items[:index] + [Item("wrapper", wrapper.node, wrapper.inner, "", wrapper.name, source)]
                    + members + items[index + 1:]), found, found_exact
    return items, None, False


def _target(request: ExtractionRequest, items: list[Item]) -> tuple[Item | None, bool]:
    named = [i for i in items if i.kind == "function" and i.name == request.function and not i.inner.has_error]
    if not named:
        named = [i for i in items if i.kind == "definition" and i.name == request.function
                 and not i.inner.has_error]
    exact = [i for i in named if i.accepts(request.param_count)]
    if exact:
        return exact[-1], True
    return (named[-1], False) if named else (None, False)


def _select(request: ExtractionRequest, reading: _Reading) -> Extraction:
    spec = request.spec
    target = reading.target
    kept = _closure(request, reading.items, target)
    preamble = _preamble_imports(spec, request.preamble)
    kept, again = _not_redefined(kept, target, preamble)
    used = set().union(*(i.refs for i in kept)) if kept else set()
    imports, dropped = [], []
    for item in reading.items:
        if item.kind == "import":
            reason = _import_drop_reason(spec, item, preamble, used)
            text, parts_dropped = (None, []) if reason else _import_text(spec, item, preamble, used)
            dropped.extend(parts_dropped)
            if reason:
                dropped.append(f"{_short(item.text)} ({reason})")
            elif text is not None:
                imports.append(Item("import", item.node, item.inner, text, source=item.source, bound=item.bound))
        elif item.kind in ("function", "definition", "other") and item not in kept:
            dropped.append(_short(item.text) if item.kind == "other" else
                           item.label + (" (already in the preamble)" if item in again else ""))
    wrapped = any(i.kind == "wrapper" for i in reading.items)
    outside = [i for i in kept if wrapped and not i.wrapped and i is not target]
    inside = [i for i in kept if i not in outside]
    record = {
        "policy": policy_label("syntax"),
        "method": "parser",
        "source": reading.where,
        "kept": [i.label for i in kept],
    }
    if wrapped:
        record["unwrapped"] = next(i.label for i in reading.items if i.kind == "wrapper")
    if imports:
        record["imports"] = [_short(i.text) for i in imports]
    if dropped:
        record["dropped"] = dropped
    if not reading.exact:
        record["note"] = f"{request.function} takes a different number of parameters than the problem declares"
    return Extraction(
        code="\n\n".join(i.text.rstrip() for i in inside) + "\n",
        imports="\n".join(i.text.rstrip() for i in imports),
        types="\n\n".join(i.text.rstrip() for i in outside),
        record=record,
    )


def _closure(request: ExtractionRequest, items: list[Item], target: Item) -> list[Item]:
    """The target and, transitively, every definition it mentions by name."""
    spec = request.spec
    by_name: dict[str, list[Item]] = {}
    for item in items:
        if item.kind in ("function", "definition") and item.name:
            if item.name in spec.entry_points:
                continue
            by_name.setdefault(item.name, []).append(item)
    chosen = {id(target)}
    pending = [(name, target) for name in target.refs]
    initializers = [i for i in items if i.kind == "function" and i.name in spec.initializers]
    while pending:
        while pending:
            name, user = pending.pop()
            for item in by_name.get(name, []):
                if item.inner.type in spec.lexical and item.node.start_byte > user.node.start_byte:
                    continue  # out of the user's scope: a script's `my $start = <STDIN>` after the sub
                if item.name in spec.initializers:
                    continue  # never called by name: kept below for what it sets up
                if id(item) not in chosen and (item.kind != "function" or item.name != request.function
                                               or item.accepts(request.param_count)):
                    chosen.add(id(item))
                    pending.extend((n, item) for n in item.refs)
        # A function the language runs by itself (Go's init) goes with what it sets up.
        kept_names = {i.name for i in items if id(i) in chosen and i.name}
        for item in initializers:
            if id(item) not in chosen and (item.refs - {item.name}) & kept_names:
                chosen.add(id(item))
                pending.extend((n, item) for n in item.refs)
    return [i for i in items if id(i) in chosen]


@dataclass(frozen=True)
class _PreambleImports:
    texts: frozenset[str]
    names: frozenset[str]
    defined: frozenset[str] = frozenset()  # functions and types the preamble itself declares


@lru_cache(maxsize=512)
def _preamble_imports_cached(spec: ExtractionSpec, preamble: str) -> _PreambleImports:
    source = preamble.encode("utf-8", "surrogatepass")
    root = parse(spec, source).root_node
    items = _all_items(spec, source, root)
    found = [i for i in items if i.kind == "import"]
    return _PreambleImports(frozenset(_normal(i.text) for i in found),
                            frozenset().union(*(i.bound for i in found)) if found else frozenset(),
                            frozenset(i.name for i in items if i.kind in ("function", "definition") and i.name))


def _preamble_imports(spec: ExtractionSpec, preamble: str) -> _PreambleImports:
    if not preamble.strip():
        return _PreambleImports(frozenset(), frozenset())
    return _preamble_imports_cached(spec, preamble)


def _all_items(spec: ExtractionSpec, source: bytes, root) -> list[Item]:
    """Items at the top and one level into containers (a preamble that opens a class)."""
    items = []
    for child in root.named_children:
        items.append(item_of(spec, source, child))
        if child.type == "ERROR":
            items.extend(items_of(spec, source, child))
    return items


def _import_drop_reason(spec: ExtractionSpec, item: Item, preamble: _PreambleImports, used: set[str]) -> str | None:
    if _normal(item.text) in preamble.texts:
        return "already in the preamble"
    return _names_drop_reason(spec, item.bound, preamble, used)


def _names_drop_reason(spec: ExtractionSpec, bound: frozenset[str], preamble: _PreambleImports,
                       used: set[str]) -> str | None:
    if bound and bound <= preamble.names:
        return "already in the preamble"
    if spec.unused_imports == "drop" and bound and not (bound & used):
        return "not used by the kept code"
    return None


def _import_text(spec: ExtractionSpec, item: Item, preamble: _PreambleImports,
                 used: set[str]) -> tuple[str | None, list[str]]:
    """An import's text less the parts of a group (``import (...)``) that the preamble already
    binds or that go unused where that is an error, each dropped with the line it stands on
    alone (a part sharing its line stays: nothing is rewritten); None when no part is left."""
    lines, dropped = item.text.split("\n"), []
    for names, part in item.parts:
        reason = _names_drop_reason(spec, names, preamble, used)
        alone = [n for n, line in enumerate(lines) if line.strip() == part]
        if reason and alone:
            del lines[alone[0]]
            dropped.append(f"{part} ({reason})")
    if item.parts and len(dropped) == len(item.parts):
        return None, dropped
    return "\n".join(lines), dropped


def _not_redefined(kept: list[Item], target: Item, preamble: _PreambleImports) -> tuple[list[Item], list[Item]]:
    """Drop a helper that declares a name the preamble declares (a type copied from the
    prompt): compiled languages reject the second declaration."""
    again = [i for i in kept if i is not target and i.kind in ("function", "definition") and i.name in preamble.defined]
    return [i for i in kept if i not in again], again


def _normal(text: str) -> str:
    return " ".join(text.split())


def _short(text: str, width: int = 60) -> str:
    line = " ".join(text.split())
    return line if len(line) <= width else line[: width - 1] + "…"


# --- whole programs -------------------------------------------------------------------------

def _program(request: ExtractionRequest) -> Extraction:
    """A program is kept whole, ``main`` and all: only the block is chosen. A continuation of a
    program's prompt has no function to end at, so it keeps the stop sequences."""
    if request.mode == "continue":
        done = _textual(request, "a program's continuation ends at its stop sequences")
        done.record["policy"] = policy_label("syntax")
        return done
    spec = request.spec
    blocks = fenced_blocks(request.completion)
    if not blocks:
        return Extraction(request.completion, record={"policy": policy_label("syntax"), "method": "parser",
                                                      "source": "the whole text"})
    ranked = []
    for number, block in enumerate(blocks, start=1):
        source = block.text.encode("utf-8", "surrogatepass")
        root = parse(spec, source).root_node
        other_language = bool(block.tag) and block.tag not in spec.tags
        entry = any(functions_named(spec, source, root, name) for name in spec.entry_points)
        # This language's blocks first, a tagged one before an untagged one, then one with an
        # entry point (main), then one that parses cleanly; a usage line is shorter than a program.
        rank = (not other_language, bool(block.tag) and not other_language, entry, not root.has_error,
                len(block.text.strip()))
        ranked.append((rank, number, block))
    _, number, block = max(ranked, key=lambda entry: (entry[0], entry[1]))
    where = f"block {number} of {len(blocks)}" + (f" ({block.tag})" if block.tag else "")
    return Extraction(block.text + "\n", record={"policy": policy_label("syntax"), "method": "parser",
                                                 "source": where, "kept": ["the whole block"]})


# --- continue mode --------------------------------------------------------------------------

def _continue(request: ExtractionRequest) -> Extraction:
    spec = request.spec
    prompt = request.prompt.encode("utf-8", "surrogatepass")
    source = prompt + request.completion.encode("utf-8", "surrogatepass")
    root = parse(spec, source).root_node
    targets = [n for n in functions_named(spec, source, root, request.function)
               if n.start_byte < len(prompt) < n.end_byte and not n.has_error]
    if not targets:
        fallback = _textual(request, f"the text does not parse as a complete {request.function}")
        fallback.record["policy"] = policy_label("syntax")
        return fallback
    target_node = targets[-1]
    target = item_of(spec, source, target_node)
    container = target_node.parent
    later = [i for i in items_of(spec, source, container) if i.node.start_byte >= target_node.end_byte]
    kept = [i for i in _closure(request, [target] + later, target) if i is not target]
    kept = _not_redefined(kept, target, _preamble_imports(spec, request.preamble))[0]
    imports = []
    if spec.late_imports == "keep":
        # Written after the function but legal there (an #include, a use, a require): kept unless
        # the prompt already has it, so that binding a name twice cannot break the build.
        before = _preamble_imports(spec, request.prompt)
        used = set().union(target.refs, *(i.refs for i in kept))
        imports = [i for i in later if i.kind == "import" and not _import_drop_reason(spec, i, before, used)]
    chosen = [i for i in later if i in kept or i in imports]
    dropped = [(i.label if i.kind != "other" else _short(i.text)) for i in later if i not in chosen]
    tail = source[target_node.end_byte:]
    record = {"policy": policy_label("syntax"), "method": "parser",
              "source": f"{request.function} ends at line {target_node.end_point[0] + 1}"}
    if chosen:
        record["kept"] = [i.label for i in chosen]
    if dropped or (tail.strip() and not chosen):
        record["dropped"] = dropped or [_short(tail.decode("utf-8", "replace"))]
    code = source[:target_node.end_byte].decode("utf-8", "surrogatepass")
    for item in chosen:
        code += "\n\n" + item.text.rstrip()
    return Extraction(code + "\n", record=record)
