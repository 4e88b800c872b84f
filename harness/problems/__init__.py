"""Problems: the language-neutral type system and problem sets (YAML folders) loaded into
immutable records. Owns what a problem declares and how a reported value is judged against it."""

from .sets import Case, Param, Problem, ProblemError, ProblemSet, load_problem_set, parse_problem, resolve_set_path
from .types import FloatRule, Type, TypeSyntaxError, check_value, parse_type, values_equal

__all__ = ["Case", "FloatRule", "Param", "Problem", "ProblemError", "ProblemSet", "Type", "TypeSyntaxError",
           "check_value", "load_problem_set", "parse_problem", "parse_type", "resolve_set_path", "values_equal"]
