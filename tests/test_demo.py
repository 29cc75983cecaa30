"""The demo report's comparisons and cautions match the methods it shows."""

from __future__ import annotations

import re

from masstransfer.demo import demo_report


def test_demo_compares_water_in_air_with_measured_values():
    out = demo_report()
    # CRC Handbook, "Diffusion in gases" (after Marrero & Mason 1972): water in air at 101.325 kPa
    assert "24.2 at 20 C, 39.9 at 100 C" in out
    assert "Marrero & Mason 1972" in out
    fuller = re.search(r"Fuller: ([+-]\d+) % at 20 C, ([+-]\d+) % at 100 C", out)
    brokaw = re.search(r"Brokaw: ([+-]\d+) % at 20 C, ([+-]\d+) % at 100 C", out)
    assert fuller is not None
    assert brokaw is not None
    # the stated closer method is the one with the smaller deviations printed above it
    f = sum(abs(int(v)) for v in fuller.groups())
    b = sum(abs(int(v)) for v in brokaw.groups())
    assert f"{'Fuller' if f < b else 'Brokaw'} is the closer on these data" in out


def test_demo_cautions_name_the_methods_it_uses():
    out = demo_report()
    caution = out[out.index("Cautions:") :]
    for method in ("Fuller", "Brokaw", "Wilke-Lee", "Hayduk-Minhas"):
        assert method in caution
    assert "Chapman-Enskog" not in out
    assert "Wilke-Chang" not in out
