"""Reading source text with a tree-sitter grammar: top-level items (functions, other
definitions, imports), their names, parameter counts, and the names they mention.

Everything here is a selection over the parse tree; no text is generated.
"""

from __future__ import annotations

import importlib
import re
import threading
import time
import warnings
from dataclasses import dataclass, field
from functools import cached_property, lru_cache

import tree_sitter

from .spec import ExtractionSpec

_WORD = re.compile(r"[^\W\d]\w*|\$\w+", re.UNICODE)
_FIRST_WORD = re.compile(rb"\s*([A-Za-z_]\w*)")
_PUNCTUATION = re.compile(rb";+")
_local = threading.local()
MAX_DEPTH = 12


class GrammarMissing(RuntimeError):
    """The grammar a runtime declares is not installed."""


@lru_cache(maxsize=None)
def language(module: str, function: str) -> tree_sitter.Language:
    try:
        loaded = importlib.import_module(module)
    except ImportError:
        raise GrammarMissing(f"tree-sitter grammar {module!r} is not installed "
                             f"(pip install {module.replace('_', '-')})") from None
    entry = getattr(loaded, function, None)
    if entry is None:
        raise GrammarMissing(f"grammar module {module!r} has no function {function!r}")
    with warnings.catch_warnings():
        # Some grammar wheels still hand over a pointer as an int, which tree-sitter accepts
        # with a DeprecationWarning; the language works the same.
        warnings.simplefilter("ignore", DeprecationWarning)
        return tree_sitter.Language(entry())


class ParseBudgetExceeded(RuntimeError):
    """The grammar needed far more work than text of this size takes (some grammars are
    quadratic on hostile input: tree-sitter-perl on a list of 20,000 numbers takes a minute)."""


# The parser reads the text through a callback, a chunk at a time, and asks again for what it
# reads twice. Ordinary code takes a few calls per chunk (Perl's scanner up to ~300); a text that
# needs more than the budget below is given up on, deterministically: the same text is given up
# on on every machine. The wall-clock cap is a last resort for work the reads do not show.
READ_CHUNK = 4096
READS_PER_CHUNK = 400
MIN_READS = 5_000
PARSE_WALL_SECONDS = 5.0


def parse(spec: ExtractionSpec, source: bytes) -> tree_sitter.Tree:
    """Parsers are not thread-safe: each thread keeps its own per grammar. Raises
    ParseBudgetExceeded when the text needs more work than its size warrants."""
    parsers = _local.__dict__.setdefault("parsers", {})
    key = (spec.grammar, spec.grammar_function)
    parser = parsers.get(key)
    if parser is None:
        parser = parsers[key] = tree_sitter.Parser(language(*key))
    budget = max(MIN_READS, READS_PER_CHUNK * (len(source) // READ_CHUNK + 1))
    deadline = time.monotonic() + PARSE_WALL_SECONDS
    reads = 0
    exceeded = False

    def read(offset: int, _point) -> bytes:
        nonlocal reads, exceeded
        reads += 1
        if exceeded or reads > budget or (reads % 256 == 0 and time.monotonic() > deadline):
            exceeded = True
            return b""  # an end of input: the parser finishes at once
        return source[offset:offset + READ_CHUNK]

    tree = parser.parse(read)
    if exceeded:
        raise ParseBudgetExceeded(f"the text needs more parsing work than its size warrants "
                                  f"(over {budget:,} reads of {len(source):,} bytes)")
    return tree


@dataclass(eq=False)
class Item:
    """A top-level piece of a source file (or a member of an unwrapped class). The names it
    mentions are read only when asked for: most items are dropped unread."""

    kind: str  # function | definition | import | other
    node: tree_sitter.Node
    inner: tree_sitter.Node
    text: str
    name: str | None = None
    source: bytes = b""
    params: tuple[int, float] | None = None  # (required, most); None: not declared
    wrapped: bool = False
    bound: frozenset[str] = field(default_factory=frozenset)
    parts: tuple[tuple[frozenset[str], str], ...] = ()  # an import group's pieces: (names, text)

    @cached_property
    def refs(self) -> frozenset[str]:
        return words(self.source, self.node) if self.source else frozenset()

    @property
    def label(self) -> str:
        return f"{self.kind} {self.name}" if self.name else self.inner.type

    def accepts(self, count: int) -> bool:
        return self.params is None or self.params[0] <= count <= self.params[1]


def items_of(spec: ExtractionSpec, source: bytes, container: tree_sitter.Node, wrapped: bool = False) -> list[Item]:
    items, attached = [], []
    for child in container.named_children:
        if "comment" in child.type:
            continue
        if child.type in spec.attributes:
            attached.append(child)
            continue
        item = item_of(spec, source, child, wrapped)
        if attached:
            # `#[derive(Default)]` is the struct's sibling in the tree but part of it in the language.
            item.text = source[_text_start(source, attached[0]):_text_start(source, child)].decode(
                "utf-8", "replace") + item.text
            attached = []
        items.append(item)
    return items + [item_of(spec, source, node, wrapped) for node in attached]


def item_of(spec: ExtractionSpec, source: bytes, node: tree_sitter.Node, wrapped: bool = False) -> Item:
    inner = _unwrap_transparent(spec, node)
    # A wrapper that the runtime cannot take (`export` in a CommonJS script) is looked through
    # and left out: the declaration inside it is what is kept.
    shown = inner if node.type in spec.inner_only else node
    text = node_text(source, shown) + _trailing_punctuation(source, shown)
    if _is_import(spec, source, node) or (inner is not node and _is_import(spec, source, inner)):
        return Item("import", node, inner, text, source=source, wrapped=wrapped,
                    bound=frozenset(import_names(spec, source, inner)), parts=import_parts(spec, source, inner))
    if inner.type in spec.functions or inner.type in spec.definitions:
        kind = "function" if inner.type in spec.functions else "definition"
        name = definition_name(source, inner, spec.definitions.get(inner.type))
        if name is None:  # `print(x)` is an expression statement, like `LIMIT = 3`
            return Item("other", node, inner, text, source=source, wrapped=wrapped)
        params = parameter_range(spec, inner) if kind == "function" else None
        return Item(kind, node, inner, text, name, source, params, wrapped)
    return Item("other", node, inner, text, source=source, wrapped=wrapped)


def _is_import(spec: ExtractionSpec, source: bytes, node: tree_sitter.Node) -> bool:
    if node.type not in spec.imports:
        return False
    first_words = spec.imports[node.type]
    if first_words is None:
        return True
    first = _FIRST_WORD.match(source, node.start_byte, node.end_byte)
    return first is not None and first.group(1).decode("utf-8", "replace") in first_words


def _trailing_punctuation(source: bytes, node: tree_sitter.Node) -> str:
    """Some grammars leave a statement's terminator beside it rather than inside it (``;``
    after ``my %seen`` or after ``struct S {...}``): anonymous punctuation tokens that follow
    the node on the line where it ends belong to its text."""
    end = node.end_byte
    sibling = node.next_sibling
    while (sibling is not None and not sibling.is_named and sibling.start_point[0] == node.end_point[0]
           and _PUNCTUATION.fullmatch(source, sibling.start_byte, sibling.end_byte)):
        end = sibling.end_byte
        sibling = sibling.next_sibling
    return source[node.end_byte:end].decode("utf-8", "replace")


def _unwrap_transparent(spec: ExtractionSpec, node: tree_sitter.Node) -> tree_sitter.Node:
    for _ in range(MAX_DEPTH):
        if node.type not in spec.transparent:
            return node
        inner = next((c for c in node.named_children
                      if spec.defines(c.type) or c.type in spec.transparent or c.type in spec.imports), None)
        if inner is None:
            return node
        node = inner
    return node


def node_text(source: bytes, node: tree_sitter.Node) -> str:
    """The node's text, from the start of its line when only blanks precede it there, so that
    relative indentation survives."""
    return source[_text_start(source, node):node.end_byte].decode("utf-8", "replace")


def _text_start(source: bytes, node: tree_sitter.Node) -> int:
    start = node.start_byte
    line_start = source.rfind(b"\n", 0, start) + 1
    return line_start if not source[line_start:start].strip() else start


def words(source: bytes, node: tree_sitter.Node) -> frozenset[str]:
    """The identifier-like names a node mentions: its named leaves that are words."""
    found: set[str] = set()
    stack = [node]
    while stack:
        current = stack.pop()
        if current.child_count == 0:
            if current.is_named:
                text = source[current.start_byte:current.end_byte].decode("utf-8", "replace")
                if _WORD.fullmatch(text):
                    found.add(text.lstrip("$"))
            continue
        stack.extend(current.children)
    return frozenset(found)


def definition_name(source: bytes, node: tree_sitter.Node, field_hint: str | None = None) -> str | None:
    """Follow ``name``/``declarator`` fields (C's declarators nest: ``int *f(...)``) down to
    the identifier that names a definition."""
    if field_hint:
        for path in field_hint.split("|"):
            named = _follow(node, path.strip())
            if named is not None:
                return _leaf_name(source, named)
        return None
    current = node
    for _ in range(MAX_DEPTH):
        child = current.child_by_field_name("name") or current.child_by_field_name("declarator")
        if child is None:
            child = next((c for c in current.named_children
                          if c.type.endswith(("declarator", "_spec", "assignment", "declaration"))), None)
        if child is None:
            child = current.child_by_field_name("left") or current.child_by_field_name("pattern")
        if child is None:
            return None
        if child.child_count == 0 or "identifier" in child.type or child.type in ("name", "constant"):
            return _leaf_name(source, child)
        current = child
    return None


def _follow(node: tree_sitter.Node, path: str) -> tree_sitter.Node | None:
    """Walk ``a/b/c``: each step is a field of the current node, else its first named child
    of that node type."""
    for step in path.split("/"):
        found = node.child_by_field_name(step) or next((c for c in node.named_children if c.type == step), None)
        if found is None:
            return None
        node = found
    return node


def _leaf_name(source: bytes, node: tree_sitter.Node) -> str | None:
    text = source[node.start_byte:node.end_byte].decode("utf-8", "replace").strip()
    # `Solution::foo`, `M.foo`, `$foo`: the last word names it.
    parts = re.findall(r"[^\W\d]\w*", text)
    return parts[-1] if parts else None


def parameter_range(spec: ExtractionSpec, node: tree_sitter.Node) -> tuple[int, float] | None:
    """(required, most) parameters of a function node; None when the language declares none
    (a Perl sub reads @_)."""
    params = _find_parameters(spec, node)
    if params is None:
        return None
    required, most = 0, 0.0
    for child in params.named_children:
        kind = child.type
        if "comment" in kind or kind in spec.skip_parameters:
            continue
        names = len(child.children_by_field_name("name"))
        count = names if names > 1 else 1
        if any(word in kind for word in ("splat", "variadic", "vararg", "rest", "spread", "dictionary")):
            most = float("inf")
            continue
        optional = (any(word in kind for word in ("default", "optional"))
                    or any(child.child_by_field_name(f) is not None for f in ("value", "default_value", "default")))
        most += count
        if not optional:
            required += count
    return required, most


def _find_parameters(spec: ExtractionSpec, node: tree_sitter.Node) -> tree_sitter.Node | None:
    queue = [(node, 0)]
    while queue:
        current, depth = queue.pop(0)
        for name in spec.parameters:
            found = current.child_by_field_name(name)
            if found is not None:
                return found
        if depth < 4:
            queue.extend((c, depth + 1) for c in current.named_children
                         if c.type not in ("block", "compound_statement", "statement_block", "body_statement"))
    return None


def import_names(spec: ExtractionSpec, source: bytes, node: tree_sitter.Node) -> set[str]:
    """The names an import binds, for the languages where binding one twice is an error."""
    def text(n) -> str:
        return source[n.start_byte:n.end_byte].decode("utf-8", "replace")

    if spec.import_naming == "go_import":
        return set().union(*(_go_spec_names(source, n) for n in _descendants(node, "import_spec")))
    if spec.import_naming == "rust_use":
        return _rust_use_names(node, text)
    if spec.import_naming == "es_import":
        names = set()
        for child in _descendants(node, "import_specifier"):
            alias = child.child_by_field_name("alias") or child.child_by_field_name("name")
            if alias is not None:
                names.add(text(alias))
        for clause in _descendants(node, "import_clause"):
            for child in clause.named_children:
                if child.type == "identifier":
                    names.add(text(child))
        for child in _descendants(node, "namespace_import"):
            names |= {text(c) for c in child.named_children if c.type == "identifier"}
        return names
    return set()


def import_parts(spec: ExtractionSpec, source: bytes, node: tree_sitter.Node) -> tuple[tuple[frozenset[str], str], ...]:
    """The pieces of a grouped import that each bind names of their own (Go's specs inside
    ``import (...)``), with their text, so that one can be dropped without the others."""
    if spec.import_naming != "go_import":
        return ()
    pieces = list(_descendants(node, "import_spec"))
    if len(pieces) < 2:
        return ()
    return tuple((frozenset(_go_spec_names(source, piece)),
                  source[piece.start_byte:piece.end_byte].decode("utf-8", "replace").strip()) for piece in pieces)


def _go_spec_names(source: bytes, spec_node: tree_sitter.Node) -> set[str]:
    alias = spec_node.child_by_field_name("name")
    path = spec_node.child_by_field_name("path")
    if alias is not None:
        return {source[alias.start_byte:alias.end_byte].decode("utf-8", "replace")}
    if path is not None:
        return {source[path.start_byte:path.end_byte].decode("utf-8", "replace").strip('"`').rsplit("/", 1)[-1]}
    return set()


def _rust_use_names(node: tree_sitter.Node, text) -> set[str]:
    names: set[str] = set()

    def visit(n) -> None:
        if n.type == "use_as_clause":
            alias = n.child_by_field_name("alias")
            if alias is not None:
                names.add(text(alias))
        elif n.type == "scoped_identifier":
            name = n.child_by_field_name("name")
            if name is not None:
                names.add(text(name))
        elif n.type in ("identifier", "crate", "self"):
            names.add(text(n))
        elif n.type == "use_wildcard":
            return
        else:
            for child in n.named_children:
                if child.type == "scoped_identifier" and n.type == "scoped_use_list":
                    continue  # the path before a {list}
                visit(child)

    argument = node.child_by_field_name("argument")
    if argument is not None:
        visit(argument)
    return names


def _descendants(node: tree_sitter.Node, node_type: str):
    stack = [node]
    while stack:
        current = stack.pop()
        if current.type == node_type:
            yield current
        stack.extend(reversed(current.named_children))


def functions_named(spec: ExtractionSpec, source: bytes, root: tree_sitter.Node, name: str,
                    within: int = 4) -> list[tree_sitter.Node]:
    """Function nodes named ``name`` at most ``within`` levels down (inside a class, say)."""
    found = []
    queue = [(root, 0)]
    while queue:
        current, depth = queue.pop(0)
        for child in current.named_children:
            inner = _unwrap_transparent(spec, child)
            if inner.type in spec.functions and definition_name(source, inner, spec.definitions.get(inner.type)) == name:
                found.append(child)
            elif depth < within:
                queue.append((child, depth + 1))
    return found
