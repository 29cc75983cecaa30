"""The documentation site: built with warnings as errors, served locally, read in headless Chromium.

The build needs the ``docs`` extra; the browser test needs Debian's ``chromium`` and
``chromium-driver`` (``.ci/run`` installs them).  Pages are served from 127.0.0.1 only, and the
test checks that every resource a page loads comes from there: equations are typeset by the
site's own copy of MathJax, with no network.
"""

from __future__ import annotations

import functools
import http.server
import os
import shutil
import subprocess
import sys
import tempfile
import threading
from collections.abc import Iterator
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parent.parent
CHROMIUM = "/usr/bin/chromium"
CHROMEDRIVER = "/usr/bin/chromedriver"


@pytest.fixture(scope="module")
def site(tmp_path_factory: pytest.TempPathFactory) -> Path:
    pytest.importorskip("sphinx", reason='the docs extra is not installed: pip install -e ".[docs]"')
    pytest.importorskip("myst_nb", reason='the docs extra is not installed: pip install -e ".[docs]"')
    out = tmp_path_factory.mktemp("site")
    doctrees = tmp_path_factory.mktemp("doctrees")
    build = subprocess.run(
        [
            sys.executable,
            "-m",
            "sphinx",
            "-W",
            "--keep-going",
            "-q",
            "-b",
            "html",
            "-d",
            str(doctrees),
            str(ROOT / "docs"),
            str(out),
        ],
        capture_output=True,
        text=True,
        cwd=ROOT,
    )
    assert build.returncode == 0, build.stdout + build.stderr
    return out


def test_site_has_the_api_notebooks_validation_and_cautions(site: Path) -> None:
    for page in ("index", "api", "validation", "cautions", "notebooks"):
        assert (site / f"{page}.html").is_file(), page
    api = site / "api"
    for sub in ("diffusivity", "surface", "bodies", "substances", "sweep"):
        assert (api / f"masstransfer.{sub}.html").is_file(), sub
    assert (api / "masstransfer.diffusivity.fuller.html").is_file()
    notebooks = sorted(p.stem for p in (site / "notebooks").glob("*.html"))
    assert notebooks == sorted(p.stem for p in (ROOT / "notebooks").glob("*.ipynb"))
    assert (site / "_static" / "mathjax" / "tex-mml-chtml.js").is_file()
    text = "\n".join(p.read_text(encoding="utf-8") for p in site.rglob("*.html"))
    assert "cdn.jsdelivr" not in text
    assert "https://cdn" not in text
    assert "licensed engineering practice" in (site / "cautions.html").read_text(encoding="utf-8")
    assert "wilke-chang" in (site / "validation.html").read_text(encoding="utf-8")


class _Quiet(http.server.SimpleHTTPRequestHandler):
    def log_message(self, format: str, *args: object) -> None:
        pass


@pytest.fixture(scope="module")
def served(site: Path) -> Iterator[str]:
    handler = functools.partial(_Quiet, directory=str(site))
    server = http.server.ThreadingHTTPServer(("127.0.0.1", 0), handler)
    thread = threading.Thread(target=server.serve_forever, daemon=True)
    thread.start()
    try:
        yield f"http://127.0.0.1:{server.server_address[1]}"
    finally:
        server.shutdown()
        server.server_close()


@pytest.fixture(scope="module")
def browser() -> Iterator[object]:
    if not (Path(CHROMIUM).exists() and Path(CHROMEDRIVER).exists()):
        if os.environ.get("CI") == "true":  # .ci/run installs them: a missing browser is a failure there
            pytest.fail("CI must install chromium and chromium-driver (see .ci/run)")
        pytest.skip("headless Chromium is not installed here (apt-get install chromium chromium-driver)")
    webdriver = pytest.importorskip("selenium.webdriver", reason='selenium missing: pip install -e ".[docs]"')
    from selenium.webdriver.chrome.service import Service

    profile = tempfile.mkdtemp(prefix="mt-docs-chromium-")
    options = webdriver.ChromeOptions()
    options.binary_location = CHROMIUM
    for flag in (
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        f"--user-data-dir={profile}",
        "--window-size=1200,900",
    ):
        options.add_argument(flag)
    driver = webdriver.Chrome(service=Service(executable_path=CHROMEDRIVER), options=options)
    driver.set_page_load_timeout(60)
    try:
        yield driver
    finally:
        driver.quit()
        shutil.rmtree(profile, ignore_errors=True)


_TYPESET = """
const done = arguments[arguments.length - 1];
const wait = (n) => {
  const ready = window.MathJax && MathJax.startup && MathJax.startup.promise;
  if (ready) { MathJax.startup.promise.then(() => done(true), () => done(false)); }
  else if (n > 0) { setTimeout(() => wait(n - 1), 100); }
  else { done(false); }
};
wait(200);
"""


def _equations(driver: object, url: str) -> list[dict[str, float]]:
    driver.get(url)  # type: ignore[attr-defined]
    driver.set_script_timeout(60)  # type: ignore[attr-defined]
    assert driver.execute_async_script(_TYPESET), f"MathJax did not finish typesetting {url}"  # type: ignore[attr-defined]
    hosts = driver.execute_script(  # type: ignore[attr-defined]
        "return performance.getEntriesByType('resource').map(e => new URL(e.name).host)"
    )
    assert set(hosts) <= {url.split("/")[2]}, f"{url} loaded resources from {set(hosts)}"
    return driver.execute_script(  # type: ignore[attr-defined, no-any-return]
        "return Array.from(document.querySelectorAll('mjx-container')).map(e => {"
        "  const r = e.getBoundingClientRect();"
        "  return {width: r.width, height: r.height, glyphs: e.querySelectorAll('mjx-c').length,"
        "          display: e.getAttribute('display') === 'true',"
        "          raw: e.textContent.includes('\\\\frac')}; })"
    )


@pytest.mark.parametrize(
    "page",
    [
        "api/masstransfer.diffusivity.fuller.html",
        "api/masstransfer.surface.mass_transfer_coefficient_from_heat.html",
        "api/masstransfer.sweep.evaporation_flux.html",
    ],
)
def test_equations_render_as_a_reader_sees_them(browser: object, served: str, page: str) -> None:
    found = _equations(browser, f"{served}/{page}")
    assert found, f"no typeset equation on {page}"
    for eq in found:
        assert eq["width"] > 5, eq  # laid out on the page, not hidden
        assert eq["height"] > 5, eq
        assert eq["glyphs"] >= 1, eq  # drawn with MathJax's own glyphs (CHTML output)
        assert not eq["raw"], eq  # no TeX source left showing
    # the method's equation itself, displayed: a fraction and many glyphs
    assert any(eq["display"] and eq["glyphs"] > 10 for eq in found), found


def test_pages_open_with_their_content(browser: object, served: str) -> None:
    for page, words in [
        ("index.html", "masstransfer"),
        ("cautions.html", "licensed engineering practice"),
        ("notebooks/evaporative_cooler_pad.html", "cooler"),
        ("api/masstransfer.sweep.html", "design_grid"),
    ]:
        browser.get(f"{served}/{page}")  # type: ignore[attr-defined]
        body = browser.execute_script("return document.body.innerText")  # type: ignore[attr-defined]
        assert words.lower() in body.lower(), page
        assert "404" not in browser.title  # type: ignore[attr-defined]
    browser.get(f"{served}/api/masstransfer.diffusivity.fuller.html")  # type: ignore[attr-defined]
    shot = ROOT / "docs" / "_build" / "fuller-page.png"
    shot.parent.mkdir(parents=True, exist_ok=True)
    browser.save_screenshot(str(shot))  # type: ignore[attr-defined]  # to look at by eye after a run
