"""Reading the project's YAML data files with errors that name the file and line."""

from __future__ import annotations

from pathlib import Path

import yaml

# libyaml's parser when PyYAML was built with it: the same safe schema, several times faster on
# the large generated cases some problems carry.
_LOADER = getattr(yaml, "CSafeLoader", yaml.SafeLoader)


def read_yaml(file: Path, error: type[Exception]):
    """Parsed content of ``file``; malformed YAML or non-UTF-8 text raises ``error`` whose
    message starts with ``file:line``."""
    try:
        return yaml.load(file.read_text(encoding="utf-8"), Loader=_LOADER)
    except yaml.YAMLError as exc:
        mark = getattr(exc, "problem_mark", None)
        where = f"{file}:{mark.line + 1}" if mark else str(file)
        raise error(f"{where}: invalid YAML: {getattr(exc, 'problem', None) or exc}") from None
    except UnicodeDecodeError as exc:
        raise error(f"{file}: not UTF-8 text ({exc.reason} at byte {exc.start})") from None
