"""Runtimes: one data folder per language (runtime.yaml plus jinja2 templates). Owns loading a
folder, rendering prompts and programs, naming conventions, and the skeleton of a new runtime.
The engine never names a language; everything language-specific lives in the folders."""

from .filters import indent_lines, recase
from .runtime import (RUNTIME_FILE, Runtime, RuntimeConfigError, Step, available_runtimes, find_runtime_dir,
                      load_runtime, load_runtime_folder, parse_runtime)
from .skeleton import SKELETON_DIR, write_skeleton

__all__ = ["RUNTIME_FILE", "Runtime", "RuntimeConfigError", "SKELETON_DIR", "Step", "available_runtimes",
           "find_runtime_dir", "indent_lines", "load_runtime", "load_runtime_folder", "parse_runtime", "recase",
           "write_skeleton"]
