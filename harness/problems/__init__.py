"""Problems: the language-neutral type system and problem sets (YAML folders) loaded into
immutable records. Owns what a problem declares and how a reported value is judged against it:
function problems (a signature and typed cases) and program problems (stdin/stdout cases and a
checker, ``programs.py``)."""

from .calibration import CALIBRATED_FILE, read_calibrated_limits, write_calibrated_limits
from .cases import CaseError, case_cache_dir
from .programs import BUILTIN_CHECKERS, CHECKERS, CalibratedLimit, CheckerSpec, ProgramCase, ProgramProblem
from .sets import (KINDS, Case, Param, Problem, ProblemError, ProblemSet, load_problem_set, parse_problem,
                   resolve_set_path)
from .types import FloatRule, Type, TypeSyntaxError, check_value, parse_type, values_equal

__all__ = ["BUILTIN_CHECKERS", "CALIBRATED_FILE", "CHECKERS", "CalibratedLimit", "Case", "CaseError", "CheckerSpec",
           "FloatRule", "KINDS", "Param", "Problem", "ProblemError", "ProblemSet", "ProgramCase", "ProgramProblem",
           "Type", "TypeSyntaxError", "case_cache_dir", "check_value", "load_problem_set", "parse_problem",
           "parse_type", "read_calibrated_limits", "resolve_set_path", "values_equal", "write_calibrated_limits"]
