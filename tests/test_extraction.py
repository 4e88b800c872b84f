"""Extraction: fences read as Markdown reads them, the target function found by the grammar,
helpers and imports kept by need, the old textual rules under ``--extract strict``, and no
input that can make it raise."""

from __future__ import annotations

import pytest
from hypothesis import given, settings, strategies as st

from harness.engine.completions import extraction_request
from harness.extraction import ExtractionRequest, extract, fenced_blocks, parse_extraction_spec
from harness.extraction.extract import truncate_at_stops
from harness.extraction.spec import ExtractionSpecError
from harness.problems import load_problem_set
from harness.runtimes import load_runtime


@pytest.fixture(scope="module")
def core():
    return load_problem_set("core")


def run(language, problem, mode, text, core, policy="syntax"):
    runtime = load_runtime(language)
    prob = core.problems[problem]
    request = extraction_request(mode, runtime, prob, runtime.render_prompt(prob), runtime.render_preamble(prob),
                                 text, policy)
    return extract(request)


# --- fences (CommonMark 0.31, section 4.5 "Fenced code blocks", read from memory) ----------

def test_backtick_and_tilde_fences_with_and_without_tags():
    text = "a\n```python\nx = 1\n```\nb\n~~~\ny = 2\n~~~\n"
    assert [(b.tag, b.text) for b in fenced_blocks(text)] == [("python", "x = 1"), ("", "y = 2")]


def test_a_fence_closes_only_on_the_same_character_at_least_as_long():
    text = "````\n```\ninner\n```\n````\n~~~\n```\n~~~"
    assert [b.text for b in fenced_blocks(text)] == ["```\ninner\n```", "```"]


def test_an_indented_fence_in_a_list_item_loses_its_indentation_only():
    text = "1. code:\n   ```js\n   if (x) {\n     y();\n   }\n   ```\n"
    assert fenced_blocks(text)[0].text == "if (x) {\n  y();\n}"


def test_triple_backticks_inside_prose_are_not_a_fence():
    assert fenced_blocks("call ```f(1)``` here\nand ```this``` too") == []


def test_an_unclosed_fence_runs_to_the_end():
    (block,) = fenced_blocks("```python\ndef f():\n    return 1")
    assert block.text == "def f():\n    return 1" and not block.closed


def test_a_backtick_fence_info_string_may_not_hold_a_backtick():
    # CommonMark 4.5: "If the info string comes after a backtick fence, it may not contain any backtick".
    # The closing line then opens a block of its own, empty and unclosed.
    assert [(b.text, b.first_line) for b in fenced_blocks("```a`b\ncode\n```")] == [("", 3)]


# --- the textual rules (--extract strict keeps the old behaviour) ----------------------------

def test_strict_continuations_are_cut_at_the_first_stop_sequence():
    text = "    return 1\n\ndef extra():\n    pass\nprint(3)"
    assert truncate_at_stops(text, ["\ndef ", "\nprint("]) == "    return 1\n"


def test_strict_whole_mode_keeps_the_first_fenced_block(core):
    answer = "Run:\n```bash\npython3 x.py\n```\n```python\ndef add_fractions(fracs):\n    return (0, 1)\n```"
    strict = run("python", "add_fractions", "whole", answer, core, policy="strict")
    assert strict.code == "python3 x.py" and strict.record["method"] == "first_block"
    syntax = run("python", "add_fractions", "whole", answer, core)
    assert syntax.code.startswith("def add_fractions") and syntax.record["source"] == "block 2 of 2 (python)"


def test_unknown_policy_is_refused(core):
    with pytest.raises(ValueError, match="unknown extraction policy"):
        run("python", "add_fractions", "whole", "x", core, policy="guess")


# --- whole mode --------------------------------------------------------------------------------

def test_whole_mode_keeps_referenced_helpers_and_drops_main_tests_and_calls(core):
    answer = """```python
import sys
from math import gcd

LIMIT = 10

def unused():
    return 1

def reduce(n, d):
    g = gcd(n, d) or 1
    return n // g, d // g

def add_fractions(fracs):
    return reduce(sum(p for p, _ in fracs), LIMIT)

def main():
    print(add_fractions([(1, 2)]))

if __name__ == "__main__":
    main()
print(add_fractions([]))
```"""
    done = run("python", "add_fractions", "whole", answer, core)
    assert "def reduce" in done.code and "LIMIT = 10" in done.code and "def add_fractions" in done.code
    assert "def unused" not in done.code and "def main" not in done.code and "__main__" not in done.code
    assert "print(" not in done.code
    assert done.imports == "import sys\nfrom math import gcd"
    assert "function main" in done.record["dropped"] and "function unused" in done.record["dropped"]


def test_a_block_defining_the_target_with_the_right_arity_beats_one_with_another(core):
    answer = ("```python\ndef add_fractions(fracs):\n    return (1, 1)\n```\n"
              "```python\ndef add_fractions(fracs, extra, more):\n    return (2, 2)\n```")
    done = run("python", "add_fractions", "whole", answer, core)
    assert "(1, 1)" in done.code and done.record["source"] == "block 1 of 2 (python)"


def test_a_block_with_a_syntax_error_elsewhere_is_used_when_the_target_is_intact(core):
    answer = "```python\ndef add_fractions(fracs):\n    return (0, 1)\n\nprint(add_fractions([]]\n```"
    done = run("python", "add_fractions", "whole", answer, core)
    assert done.record["method"] == "parser" and done.code.strip() == "def add_fractions(fracs):\n    return (0, 1)"


def test_text_that_defines_no_target_falls_back_to_the_textual_rules_and_says_so(core):
    done = run("python", "add_fractions", "whole", "I cannot answer that.", core)
    assert done.record["method"] == "whole_text" and "no block defines add_fractions" in done.record["why"]


def test_nothing_is_rewritten_every_kept_line_is_the_models_own(core):
    answer = "```python\nfrom math import gcd  # note\n\ndef add_fractions(fracs):  # keep me\n    return (0,    1)\n```"
    done = run("python", "add_fractions", "whole", answer, core)
    for line in (done.imports + "\n" + done.code).splitlines():
        assert line in answer


# --- continue mode -----------------------------------------------------------------------------

def test_continue_mode_ends_where_the_function_ends_keeping_comments_and_strings(core):
    body = ("    total = (0, 1)\n# a comment in column 0\n    s = '''\ndef not_a_function():\n'''\n"
            "    return total\n\nprint(add_fractions([]))\n")
    done = run("python", "add_fractions", "continue", body, core)
    assert done.code.endswith("    return total\n") and "# a comment in column 0" in done.code
    assert done.record["method"] == "parser"
    strict = run("python", "add_fractions", "continue", body, core, policy="strict")
    assert "return total" not in strict.code  # the old rules cut at the comment


def test_continue_mode_keeps_a_later_helper_only_when_the_function_calls_it(core):
    body = "    return helper(fracs)\n\ndef helper(x):\n    return (0, 1)\n\ndef other():\n    return 2\n"
    done = run("python", "add_fractions", "continue", body, core)
    assert "def helper" in done.code and "def other" not in done.code
    assert done.record["kept"] == ["function helper"] and done.record["dropped"] == ["function other"]


def test_an_unfinished_function_falls_back_to_stop_sequences(core):
    done = run("python", "add_fractions", "continue", "    return (0,\n\ndef f(", core)
    assert done.record["method"] == "stop_sequences"


# --- hostile input -------------------------------------------------------------------------------

@settings(max_examples=150, deadline=None)
@given(st.text(alphabet=st.sampled_from(list("def add_fractions():\n ```~{}[]()'\"#\\x:=\t")), max_size=400),
       st.sampled_from(["whole", "continue"]))
def test_no_text_makes_extraction_raise(core, text, mode):
    done = run("python", "add_fractions", mode, text, core)
    assert isinstance(done.code, str) and done.record["method"]


def test_deep_nesting_and_huge_numbers_end_as_a_selection(core):
    deep = "```python\ndef add_fractions(fracs):\n    return " + "(" * 5000 + ")" * 5000 + "\n```"
    assert run("python", "add_fractions", "whole", deep, core).record["method"]
    big = "```python\ndef add_fractions(fracs):\n    return (" + "9" * 100000 + ", 1)\n```"
    assert "9" * 100000 in run("python", "add_fractions", "whole", big, core).code


# --- the runtime.yaml section ---------------------------------------------------------------------

def test_a_malformed_extraction_section_names_the_field():
    with pytest.raises(ExtractionSpecError, match="'functions'"):
        parse_extraction_spec({"grammar": "tree_sitter_python"})
    with pytest.raises(ExtractionSpecError, match="unknown field"):
        parse_extraction_spec({"grammar": "tree_sitter_python", "functions": ["f"], "fucntions": []})
    with pytest.raises(ExtractionSpecError, match="'import_naming'"):
        parse_extraction_spec({"grammar": "g", "functions": ["f"], "import_naming": "magic"})


def test_a_grammar_that_is_not_installed_falls_back_and_says_which(core):
    spec = parse_extraction_spec({"grammar": "tree_sitter_no_such_language", "functions": ["function_definition"]})
    request = ExtractionRequest("whole", "```\ndef f(): pass\n```", "", "", "f", 0, (), spec)
    done = extract(request)
    assert done.record["method"] == "first_block" and "tree_sitter_no_such_language" in done.record["why"]


# --- grammar data beyond Python's: imports that are calls, terminators beside a statement,
# --- names at the end of a path, varargs (each spec below is inline, not a runtime's) -----------

def _whole(spec_fields: dict, function: str, params: int, answer: str, preamble: str = ""):
    spec = parse_extraction_spec(spec_fields)
    return extract(ExtractionRequest("whole", answer, "", preamble, function, params, (), spec))


def test_an_import_may_be_a_call_known_by_its_first_word():
    # Ruby's require is an ordinary method call (Kernel#require, Ruby's core documentation; from
    # memory): only calls that start with it are imports, other top-level calls are dropped.
    spec = {"grammar": "tree_sitter_ruby", "functions": ["method"], "imports": {"call": ["require"]}}
    done = _whole(spec, "f", 1, 'require "prime"\nputs f(3)\n\ndef f(n)\n  Prime.first(n)\nend\n')
    assert done.imports == 'require "prime"' and "puts" not in done.code
    assert done.record["dropped"] == ["puts f(3)"]
    with pytest.raises(ExtractionSpecError, match="'imports'"):
        parse_extraction_spec({"grammar": "g", "functions": ["f"], "imports": {"call": "require"}})


def test_a_terminator_the_grammar_leaves_beside_a_statement_stays_with_it():
    # Perl: "Every simple statement must be terminated with a semicolon" (perlsyn, "Simple
    # Statements"; from memory). tree-sitter-perl puts that `;` beside the statement.
    spec = {"grammar": "tree_sitter_perl", "functions": ["subroutine_declaration_statement"],
            "definitions": {"expression_statement": "variable_declaration | assignment_expression/left"}}
    answer = "my %memo;\nour $depth = 2;\nsub f {\n    return $memo{$_[0]} // $depth;\n}\n"
    done = _whole(spec, "f", 1, answer)
    assert done.code == "my %memo;\n\nour $depth = 2;\n\nsub f {\n    return $memo{$_[0]} // $depth;\n}\n"


def test_a_definition_is_named_at_the_end_of_a_path_of_fields_or_node_types():
    # PHP: `const NAME = value;` at the top level defines a constant (PHP manual, "Constants",
    # "Syntax"; from memory); the grammar's const_element has no name field.
    spec = {"grammar": {"module": "tree_sitter_php", "function": "language_php"},
            "functions": ["function_definition"], "definitions": {"const_declaration": "const_element/name"}}
    answer = "<?php\nconst LIMIT = 3;\nconst OTHER = 4;\nfunction f(int $n): int { return min($n, LIMIT); }\n"
    done = _whole(spec, "f", 1, answer)
    assert done.record["kept"] == ["definition LIMIT", "function f"] and "definition OTHER" in done.record["dropped"]


def test_a_vararg_parameter_takes_any_number_of_arguments():
    # Lua 5.4 manual, 3.4.11 "Function Definitions": `...` after the fixed parameters collects
    # the extra arguments. The version with two fixed parameters cannot take one argument.
    spec = {"grammar": "tree_sitter_lua", "functions": ["function_declaration"]}
    answer = ("```lua\nfunction f(a, ...)\n  return a\nend\n```\n"
              "```lua\nfunction f(a, b)\n  return b\nend\n```")
    done = _whole(spec, "f", 1, answer)
    assert "return a" in done.code and done.record["source"] == "block 1 of 2 (lua)"


def test_wrappers_nest_a_class_inside_a_namespace_is_unwrapped_from_both():
    # C#: a namespace body holds using directives and type declarations, and a class's body its
    # methods (ECMA-334, "Namespaces" and "Classes"; from memory). A whole program puts the
    # method two wrappers deep; the namespace's own using directive is kept as an import.
    spec = parse_extraction_spec({"grammar": "tree_sitter_c_sharp", "functions": ["method_declaration"],
                                  "imports": ["using_directive"],
                                  "wrappers": {"class_declaration": "body", "namespace_declaration": "body"},
                                  "entry_points": ["Main"]})
    answer = ("using System;\nnamespace Ferries\n{\n    using System.IO;\n    class Program\n    {\n"
              "        static int F(int a) { return a + 1; }\n"
              "        static void Main() { Console.WriteLine(F(1)); }\n    }\n}\n")
    done = extract(ExtractionRequest("whole", answer, "", "", "F", 1, (), spec))
    assert done.record["method"] == "parser" and done.record["kept"] == ["function F"]
    assert done.code == "        static int F(int a) { return a + 1; }\n"
    assert done.imports == "using System;\n    using System.IO;" and "function Main" in done.record["dropped"]


def test_prose_that_swallows_unfenced_code_is_passed_over_a_paragraph_at_a_time():
    # Lua 5.4 manual, 3.1 "Lexical Conventions": `function` is a reserved word, so "The function
    # below" opens a function declaration that runs into the code after it.
    spec = {"grammar": "tree_sitter_lua", "functions": ["function_declaration"]}
    answer = "The function below adds one.\n\nlocal function f(a)\n  return a + 1\nend\n\nIt's short.\n"
    done = _whole(spec, "f", 1, answer)
    assert done.record["source"] == "the text from line 3"
    assert done.code == "local function f(a)\n  return a + 1\nend\n"
    assert _whole(spec, "f", 1, "No code here.\n\nNone here either.\n").record["method"] == "whole_text"


def test_an_inner_only_wrapper_is_looked_through_and_left_out():
    # ECMA-262 (section 16.2.3, Exports; from memory): `export` declarations belong to module
    # code; a CommonJS script (Node compiles it as a function body) refuses them. The function
    # inside is kept, the wrapper's own word is not, and the exported default `main` is dropped.
    spec = parse_extraction_spec({"grammar": "tree_sitter_javascript", "functions": ["function_declaration"],
                                  "inner_only": ["export_statement"]})
    answer = "export function f(a) {\n  return a + 1;\n}\n\nexport default function main() {\n  f(1);\n}\n"
    done = extract(ExtractionRequest("whole", answer, "", "", "f", 1, (), spec))
    assert done.code == "function f(a) {\n  return a + 1;\n}\n" and done.record["dropped"] == ["function main"]


def test_a_function_beats_a_same_named_definition_that_declares_no_parameters():
    # A block of tests that binds the name by loading it (Node's require returns the module's
    # exports; from memory) defines no function: the block that writes the function wins,
    # though it comes first; a const holding an arrow function declares its parameters.
    spec = parse_extraction_spec({"grammar": "tree_sitter_javascript", "functions": ["function_declaration"],
                                  "definitions": ["lexical_declaration"]})
    answer = ("```js\nfunction f(a) {\n  return a + 1;\n}\n```\n"
              "```js\nconst f = require(\"./f\");\ntest(\"f\", () => expect(f(1)).toBe(2));\n```\n")
    done = extract(ExtractionRequest("whole", answer, "", "", "f", 1, (), spec))
    assert done.record["source"] == "block 1 of 2 (js)" and done.record["kept"] == ["function f"]
    arrow = answer.replace("function f(a) {\n  return a + 1;\n}", "const f = (a) => a + 1;")
    done = extract(ExtractionRequest("whole", arrow, "", "", "f", 1, (), spec))
    assert done.record["source"] == "block 1 of 2 (js)" and done.code == "const f = (a) => a + 1;\n"


def test_a_lexical_definition_after_the_code_that_names_it_is_not_kept():
    # perlsub, "Private Variables via my()": a my variable is visible from its declaration to the
    # end of the enclosing block or file (from memory). So the sub's $memo is the one before it,
    # and the script's `my $start = <STDIN>` after it is another variable, not kept.
    spec = {"grammar": "tree_sitter_perl", "functions": ["subroutine_declaration_statement"],
            "definitions": {"expression_statement": "variable_declaration | assignment_expression/left"},
            "lexical": ["expression_statement"]}
    answer = ("my %memo;\nsub f {\n    my ($start) = @_;\n    return $memo{$start} //= length $start;\n}\n"
              "my $start = <STDIN>;\nprint f($start);\n")
    done = _whole(spec, "f", 1, answer)
    assert done.record["kept"] == ["definition memo", "function f"] and "definition start" in done.record["dropped"]
    plain = _whole({k: v for k, v in spec.items() if k != "lexical"}, "f", 1, answer)
    assert "definition start" in plain.record["kept"]  # without the declaration, the name alone decides


def test_an_attribute_beside_an_item_goes_with_it():
    # The Rust Reference, "Attributes": an outer attribute `#[...]` applies to the item after it
    # (from memory); tree-sitter-rust makes it that item's sibling. #[derive(Default)] stays on
    # the struct the function names, in whole and in continue mode; a test module's goes with it.
    spec = {"grammar": "tree_sitter_rust", "functions": ["function_item"],
            "definitions": ["struct_item", "mod_item"], "attributes": ["attribute_item"]}
    struct = "#[derive(Default)]\n// running total\nstruct T {\n    n: u32,\n}\n"
    function = "fn f(x: u32) -> u32 {\n    T::default().n + x\n}\n"
    done = _whole(spec, "f", 1, struct + "\n" + function + "\n#[cfg(test)]\nmod tests {}\n")
    assert done.code == struct + "\n" + function and done.record["dropped"] == ["definition tests"]
    prompt, completion = function.split("\n", 1)[0] + "\n", function.split("\n", 1)[1] + "\n" + struct
    later = extract(ExtractionRequest("continue", completion, prompt, "", "f", 1, (),
                                      parse_extraction_spec(spec)))
    assert later.code == function + "\n" + struct and later.record["kept"] == ["definition T"]


def test_a_grouped_import_loses_only_the_lines_that_would_not_compile():
    # The Go Programming Language Specification, "Import declarations" and "Declarations and
    # scope" (from memory): an import the file never refers to is illegal, and so is declaring
    # a package name twice in the file block. From one `import (...)` group "fmt" (the
    # preamble's) and "os" (used by main only) go, each with its own line.
    spec = {"grammar": "tree_sitter_go", "functions": ["function_declaration"],
            "imports": ["import_declaration"], "import_naming": "go_import", "unused_imports": "drop"}
    preamble = 'package main\n\nimport (\n\t"fmt"\n)\n'
    answer = ('package main\n\nimport (\n\t"container/heap"\n\t"fmt"\n\t"os"\n)\n\n'
              'func f(h *H) int {\n\theap.Init(h)\n\treturn 1\n}\n\nfunc main() {\n\tfmt.Println(os.Args)\n}\n')
    done = _whole(spec, "f", 1, answer, preamble)
    assert done.imports == 'import (\n\t"container/heap"\n)'
    assert {'"fmt" (already in the preamble)', '"os" (not used by the kept code)'} <= set(done.record["dropped"])
    # When every line of the group goes, so does the declaration.
    none_left = answer.replace('\t"container/heap"\n', "").replace("heap.Init(h)", "_ = fmt.Sprint(h)")
    assert _whole(spec, "f", 1, none_left, preamble).imports == ""


def test_a_type_repeated_from_the_preamble_is_not_declared_twice():
    # The Go Programming Language Specification, "Declarations and scope": no identifier may be
    # declared twice in the same block (from memory). An answer that copies the prompt's Pair
    # type uses the preamble's; its own other types stay.
    spec = {"grammar": "tree_sitter_go", "functions": ["function_declaration"], "definitions": ["type_declaration"]}
    pair = "type Pair[A, B any] struct {\n\tFirst  A\n\tSecond B\n}\n"
    answer = pair + "\ntype acc int\n\nfunc f(p Pair[int, int]) acc {\n\treturn acc(p.First)\n}\n"
    done = _whole(spec, "f", 1, answer, "package main\n\n" + pair)
    assert done.record["kept"] == ["definition acc", "function f"]
    assert "definition Pair (already in the preamble)" in done.record["dropped"]


# --- whole programs ------------------------------------------------------------------------------

def _program(language, text, mode="whole", policy="syntax"):
    runtime = load_runtime(language)
    request = ExtractionRequest(mode, text, "", "", "", 0, runtime.program.stop_sequences, runtime.extraction,
                                policy, kind="program")
    return extract(request)


def test_a_whole_program_is_chosen_by_language_and_entry_point_and_kept_whole():
    answer = ("Compile and run:\n```bash\ng++ -O2 main.cpp && ./a.out < in.txt\n```\n"
              "A helper first:\n```cpp\nint twice(int x) { return 2 * x; }\n```\n"
              "The program:\n```cpp\n#include <iostream>\nint twice(int x) { return 2 * x; }\n"
              "int main() { int n; std::cin >> n; std::cout << twice(n) << \"\\n\"; }\n```\n")
    done = _program("cpp", answer)
    assert done.code.startswith("#include <iostream>") and "int main()" in done.code
    assert done.record["source"] == "block 3 of 3 (cpp)" and done.record["method"] == "parser"
    strict = _program("cpp", answer, policy="strict")
    assert strict.code.startswith("g++")  # the textual rules take the first block


def test_a_python_program_block_beats_a_shell_block_and_keeps_its_main_guard():
    answer = ("```sh\npython3 solve.py < input.txt\n```\n```python\nimport sys\n\ndef main():\n"
              "    print(sum(map(int, sys.stdin.read().split())))\n\nif __name__ == '__main__':\n    main()\n```")
    done = _program("python", answer)
    assert "if __name__ == '__main__':" in done.code and done.record["source"] == "block 2 of 2 (python)"


def test_a_continuation_keeps_includes_written_before_its_helper(core):
    """C++ allows #include anywhere at file scope; a base model often adds one before a helper."""
    body = ("    return helper(fracs);\n}\n\n#include <sys/socket.h>\n#include <vector>\n\n"
            "std::pair<int64_t, int64_t> helper(const std::vector<std::pair<int64_t, int64_t>>& f) {\n"
            "    return {0, 1};\n}\n\nint main() { return 0; }\n")
    done = run("cpp", "add_fractions", "continue", body, core)
    assert "#include <sys/socket.h>" in done.code and "helper(const std::vector" in done.code
    assert done.code.count("#include <vector>") == 1  # the prompt has it already
    assert "int main" not in done.code


def test_text_that_a_grammar_parses_in_quadratic_time_falls_back_within_a_budget():
    """tree-sitter-perl needs seconds for a list of a few thousand numbers and about a minute for
    20,000 (measured here): such a text is given up on, the same way on every machine."""
    runtime = load_runtime("perl")
    text = "    my $filler = [" + "1, " * 4000 + "];\n    return $a_ + $b_;\n}\n"
    request = ExtractionRequest("continue", text, "sub add_pair {\n    my ($a_, $b_) = @_;\n", "", "add_pair", 2,
                                runtime.stop_sequences, runtime.extraction)
    done = extract(request)
    assert done.record["method"] == "stop_sequences" and "more parsing work" in done.record["why"]
    assert extract(request).record == done.record  # deterministic


def test_an_init_that_sets_up_a_kept_variable_is_kept_and_one_that_does_not_is_dropped(core):
    """Go runs every init function before main (The Go Programming Language Specification,
    "Package initialization", from memory): one that fills a map the solution uses belongs to it."""
    answer = ("```go\nvar weights map[string]int\n\nfunc init() {\n\tweights = map[string]int{\"a\": 1}\n}\n\n"
              "func init() {\n\tpanic(\"unrelated\")\n}\n\n"
              "func CheapestPassage(a int) int {\n\treturn weights[\"a\"] + a\n}\n```")
    runtime = load_runtime("go")
    request = ExtractionRequest("whole", answer, "", "", "CheapestPassage", 1, (), runtime.extraction)
    done = extract(request)
    assert "weights = map[string]int" in done.code and "unrelated" not in done.code
