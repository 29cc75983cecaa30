"""Sphinx configuration: the API from the numpydoc docstrings, the notebooks, equations offline.

Build with ``python -m sphinx -W --keep-going -b html docs docs/_build/html`` after
``pip install -e ".[docs]"``.  The API pages are discovered (autosummary over the package and
every public subpackage, following each ``__all__``), so a new subpackage appears without edits
here.  Equations are typeset by MathJax served from the built site itself: its files come from
the ``django-static-mathjax`` wheel (MathJax 3.2.2 with its fonts) and are copied into
``_static/mathjax`` when the build finishes; no page loads anything from another host.
"""

from __future__ import annotations

import importlib.util
import shutil
from pathlib import Path

from sphinx.application import Sphinx

import masstransfer

HERE = Path(__file__).resolve().parent
ROOT = HERE.parent

project = "masstransfer"
author = "The masstransfer developers"
copyright = "the masstransfer developers, MIT licence"
release = masstransfer.__version__
version = release

extensions = [
    "sphinx.ext.autodoc",
    "sphinx.ext.autosummary",
    "sphinx.ext.mathjax",
    "numpydoc",
    "myst_nb",
]

templates_path = ["_templates"]
exclude_patterns = ["_build", "**.ipynb_checkpoints", "api/**.rst.bak"]
source_suffix = {".rst": "restructuredtext", ".md": "myst-nb", ".ipynb": "myst-nb"}

# API: one page per public module, its members by __all__, each function on its own page
autosummary_generate = True
autosummary_ignore_module_all = False
autosummary_imported_members = False
autodoc_typehints = "none"  # the numpydoc Parameters sections carry types and units
autodoc_member_order = "bysource"
numpydoc_show_class_members = False
numpydoc_class_members_toctree = False
numpydoc_xref_param_type = False
numpydoc_validation_checks: set[str] = set()

# notebooks: shown with the outputs committed with them (the test suite executes them)
nb_execution_mode = "off"
myst_enable_extensions = ["dollarmath"]
myst_heading_anchors = 2

# equations: MathJax 3 from this site's own _static folder, never a CDN
mathjax_path = "mathjax/tex-mml-chtml.js"

html_theme = "alabaster"
html_title = f"masstransfer {release}"
html_static_path: list[str] = []
html_theme_options = {"description": "heat-mass transfer analogies and correlations", "fixed_sidebar": True}


def _mathjax_files() -> Path:
    spec = importlib.util.find_spec("mathjax")
    if spec is None or not spec.submodule_search_locations:
        raise RuntimeError('MathJax files not found: pip install -e ".[docs]" (django-static-mathjax)')
    es5 = Path(next(iter(spec.submodule_search_locations))) / "static" / "mathjax" / "es5"
    if not (es5 / "tex-mml-chtml.js").is_file():
        raise RuntimeError(f"{es5} holds no tex-mml-chtml.js; reinstall django-static-mathjax")
    return es5


def _copy_notebooks() -> None:
    target = HERE / "notebooks"
    target.mkdir(exist_ok=True)
    for nb in sorted((ROOT / "notebooks").glob("*.ipynb")):
        dest = target / nb.name
        if not dest.exists() or dest.read_bytes() != nb.read_bytes():
            shutil.copyfile(nb, dest)


def _vendor_mathjax(app: Sphinx, exc: BaseException | None) -> None:
    if exc is None and app.builder.format == "html":
        shutil.copytree(_mathjax_files(), Path(app.outdir) / "_static" / "mathjax", dirs_exist_ok=True)


def setup(app: Sphinx) -> None:
    """Check for the MathJax files, bring in the notebooks, and copy MathJax into the site."""
    _mathjax_files()  # fail early, before a long build, when the files are missing
    _copy_notebooks()
    app.connect("build-finished", _vendor_mathjax)
