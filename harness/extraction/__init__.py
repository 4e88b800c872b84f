"""Extraction: from the text a model wrote to the program that will run.

A model's answer is prose, fenced blocks, whole files, or a continuation that runs on into
tests and new functions. This package selects, never rewrites: it picks the block that defines
the target function, keeps that function with the helpers, types and imports it needs, and
records what it did, using each runtime's tree-sitter grammar declared in runtime.yaml.
"""

from .extract import (EXTRACTION_POLICIES, POLICY_VERSION, Extraction, ExtractionRequest, extract,
                      policy_label)
from .fences import fenced_blocks
from .spec import ExtractionSpec, ExtractionSpecError, parse_extraction_spec

__all__ = ["EXTRACTION_POLICIES", "POLICY_VERSION", "Extraction", "ExtractionRequest", "ExtractionSpec",
           "ExtractionSpecError", "extract", "fenced_blocks", "parse_extraction_spec", "policy_label"]
