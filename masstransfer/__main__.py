"""Allow ``python -m masstransfer``."""

from __future__ import annotations

from .cli import main

if __name__ == "__main__":  # importing the module (e.g. to document it) runs nothing
    raise SystemExit(main())
