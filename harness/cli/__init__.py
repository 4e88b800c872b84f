"""The ``assay`` command (typer): one module per command group, sharing ``common``."""

from .app import app, main

__all__ = ["app", "main"]
