"""The ``extraction:`` section of runtime.yaml: which grammar reads the language, and which of
its syntax nodes define functions, types, constants and imports. Data, so that adding a runtime
stays a folder; the node type names are the grammar's own (see its ``node-types.json``)."""

from __future__ import annotations

from dataclasses import dataclass, field

IMPORT_NAMING = ("text", "rust_use", "go_import", "es_import")


class ExtractionSpecError(ValueError):
    """A malformed ``extraction:`` section; the message names the field."""


@dataclass(frozen=True, eq=False)
class ExtractionSpec:
    """How one language's answers are read. ``definitions`` maps a node type to the field that
    names it (None: the usual ``name``/``declarator`` chain; ``a/b`` a path of fields or child
    node types; ``p | q`` alternatives, the first that leads somewhere wins). ``imports`` maps a
    node type to the first words that make it an import (None: any), for grammars where an
    import is an ordinary call (``require "set"``). ``wrappers`` maps a container type (a class
    the runtime's template supplies itself) to the field holding its members."""

    grammar: str
    grammar_function: str = "language"
    tags: tuple[str, ...] = ()
    functions: frozenset[str] = frozenset()
    definitions: dict[str, str | None] = field(default_factory=dict)
    imports: dict[str, frozenset[str] | None] = field(default_factory=dict)
    transparent: frozenset[str] = frozenset()
    inner_only: frozenset[str] = frozenset()  # transparent wrappers whose own words are not kept (export)
    attributes: frozenset[str] = frozenset()  # siblings that belong to the item after them (#[derive])
    wrappers: dict[str, str] = field(default_factory=dict)
    entry_points: frozenset[str] = frozenset({"main"})
    import_naming: str = "text"
    unused_imports: str = "keep"
    late_imports: str = "drop"
    parameters: tuple[str, ...] = ("parameters",)
    skip_parameters: frozenset[str] = frozenset()
    # Definitions seen only by code after them (a `local` in Lua, a `my` in Perl): one written
    # after the code that names it is not what that code means.
    lexical: frozenset[str] = frozenset()
    # Functions the language calls by itself before the program starts (Go's init): kept when
    # they name something kept, since they set it up.
    initializers: frozenset[str] = frozenset()

    def defines(self, node_type: str) -> bool:
        return node_type in self.functions or node_type in self.definitions


def parse_extraction_spec(raw: object) -> ExtractionSpec:
    """Read the mapping under ``extraction:``; errors name the field, the caller adds the file."""
    if not isinstance(raw, dict):
        raise ExtractionSpecError("expected a mapping")
    known = {"grammar", "tags", "functions", "definitions", "imports", "transparent", "inner_only", "wrappers",
             "entry_points", "import_naming", "unused_imports", "late_imports", "parameters",
             "skip_parameters", "attributes", "lexical", "initializers"}
    unknown = set(raw) - known
    if unknown:
        raise ExtractionSpecError(f"unknown field(s) {', '.join(sorted(unknown))}; known: {', '.join(sorted(known))}")
    grammar = raw.get("grammar")
    function = "language"
    if isinstance(grammar, dict):
        grammar, function = grammar.get("module"), grammar.get("function", "language")
    if not isinstance(grammar, str) or not grammar or not isinstance(function, str):
        raise ExtractionSpecError("'grammar': expected a module name such as tree_sitter_python, or "
                                  "{module: ..., function: ...}")

    def names(key: str, default=()) -> tuple[str, ...]:
        value = raw.get(key, list(default))
        if not isinstance(value, list) or not all(isinstance(v, str) and v for v in value):
            raise ExtractionSpecError(f"'{key}': expected a list of names")
        return tuple(value)

    def mapping(key: str, allow_none: bool) -> dict[str, str | None]:
        value = raw.get(key, {}) or {}
        if isinstance(value, list) and all(isinstance(v, str) for v in value):
            value = {v: None for v in value}
        if not isinstance(value, dict) or not all(
                isinstance(k, str) and (isinstance(v, str) or (allow_none and v is None)) for k, v in value.items()):
            raise ExtractionSpecError(f"'{key}': expected a mapping of node type to field name"
                                      + (" (or a list of node types)" if allow_none else ""))
        return dict(value)

    def word_mapping(key: str) -> dict[str, list[str] | None]:
        value = raw.get(key, {}) or {}
        if isinstance(value, list) and all(isinstance(v, str) and v for v in value):
            return {v: None for v in value}
        if not isinstance(value, dict) or not all(
                isinstance(k, str) and k and (v is None or (isinstance(v, list) and v
                                                            and all(isinstance(w, str) and w for w in v)))
                for k, v in value.items()):
            raise ExtractionSpecError(f"'{key}': expected a list of node types, or a mapping of node type "
                                      "to the list of first words that qualify it (null: any)")
        return dict(value)

    def choice(key: str, options: tuple[str, ...], default: str) -> str:
        value = raw.get(key, default)
        if value not in options:
            raise ExtractionSpecError(f"'{key}': {value!r} is not one of {', '.join(options)}")
        return value

    functions = names("functions")
    if not functions:
        raise ExtractionSpecError("'functions': name at least one node type that defines a function")
    wrappers = mapping("wrappers", allow_none=False)
    return ExtractionSpec(
        grammar=grammar,
        grammar_function=function,
        tags=tuple(t.lower() for t in names("tags")),
        functions=frozenset(functions),
        definitions=mapping("definitions", allow_none=True),
        imports={k: (frozenset(v) if v is not None else None) for k, v in word_mapping("imports").items()},
        transparent=frozenset(names("transparent")) | frozenset(names("inner_only")),
        inner_only=frozenset(names("inner_only")),
        attributes=frozenset(names("attributes")),
        wrappers={k: v for k, v in wrappers.items()},
        entry_points=frozenset(names("entry_points", ["main"])),
        import_naming=choice("import_naming", IMPORT_NAMING, "text"),
        unused_imports=choice("unused_imports", ("keep", "drop"), "keep"),
        late_imports=choice("late_imports", ("keep", "drop"), "drop"),
        parameters=names("parameters", ["parameters"]),
        skip_parameters=frozenset(names("skip_parameters")),
        lexical=frozenset(names("lexical")),
        initializers=frozenset(names("initializers")),
    )
