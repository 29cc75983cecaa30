"""The package version, defined once (read by pyproject.toml and ``masstransfer.__version__``)."""

__version__ = "0.2.0"
