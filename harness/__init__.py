"""Assay: run model-written code against hidden tests, safely, and turn outcomes into pass@k."""

__version__ = "0.1.0"
