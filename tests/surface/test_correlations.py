from __future__ import annotations

import functools
import math
import re
import warnings

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st

import masstransfer as mt
from masstransfer import surface as cat

INC = "Incropera & DeWitt 6th ed."
pi = math.pi

# (slug, inputs of the heat form, expected value written out from the source, source)
_POINTS = [
    (
        "flat-plate-laminar-local",
        {"Re": 1e5, "Pr": 0.7},
        0.332 * 1e5**0.5 * 0.7 ** (1 / 3),
        f"{INC} Eq. 7.23",
    ),
    (
        "flat-plate-laminar-average",
        {"Re": 1e5, "Pr": 0.7},
        0.664 * 1e5**0.5 * 0.7 ** (1 / 3),
        f"{INC} Eq. 7.30",
    ),
    (
        "flat-plate-laminar-flux-local",
        {"Re": 1e5, "Pr": 0.7},
        0.453 * 1e5**0.5 * 0.7 ** (1 / 3),
        f"{INC} Eq. 7.45",
    ),
    (
        "flat-plate-laminar-churchill-ozoe",
        {"Re": 1e4, "Pr": 0.02},
        0.3387 * 100 * 0.02 ** (1 / 3) / (1 + (0.0468 / 0.02) ** (2 / 3)) ** 0.25,
        f"{INC} Eq. 7.46",
    ),
    (
        "flat-plate-turbulent-local",
        {"Re": 1e6, "Pr": 0.7},
        0.0296 * 1e6**0.8 * 0.7 ** (1 / 3),
        f"{INC} Eq. 7.36",
    ),
    (
        "flat-plate-turbulent-average",
        {"Re": 1e6, "Pr": 0.7},
        0.037 * 1e6**0.8 * 0.7 ** (1 / 3),
        f"{INC} Eq. 7.41",
    ),
    # Incropera Eq. 7.38-7.39 with Re_c = 5e5: Nu_L = (0.037 Re^0.8 - 871) Pr^(1/3)
    (
        "flat-plate-mixed-average",
        {"Re": 2e6, "Pr": 0.7},
        (0.037 * 2e6**0.8 - 871) * 0.7 ** (1 / 3),
        f"{INC} Eq. 7.39",
    ),
    (
        "flat-plate-unheated-start-laminar",
        {"Re": 1e5, "Pr": 0.7, "xi_over_x": 0.5},
        0.332 * 1e5**0.5 * 0.7 ** (1 / 3) / (1 - 0.5**0.75) ** (1 / 3),
        f"{INC} Eq. 7.50",
    ),
    (
        "flat-plate-unheated-start-turbulent",
        {"Re": 1e6, "Pr": 0.7, "xi_over_x": 0.5},
        0.0296 * 1e6**0.8 * 0.7 ** (1 / 3) / (1 - 0.5**0.9) ** (1 / 9),
        f"{INC} Eq. 7.51",
    ),
    (
        "cylinder-churchill-bernstein",
        {"Re": 1e4, "Pr": 0.7},
        0.3
        + 0.62
        * 100
        * 0.7 ** (1 / 3)
        / (1 + (0.4 / 0.7) ** (2 / 3)) ** 0.25
        * (1 + (1e4 / 282000) ** 0.625) ** 0.8,
        f"{INC} Eq. 7.54",
    ),
    (
        "cylinder-hilpert",
        {"Re": 1e4, "Pr": 0.7},
        0.193 * 1e4**0.618 * 0.7 ** (1 / 3),
        f"{INC} Table 7.2 (from memory)",
    ),
    (
        "cylinder-hilpert",
        {"Re": 100.0, "Pr": 0.7},
        0.683 * 100**0.466 * 0.7 ** (1 / 3),
        f"{INC} Table 7.2 (from memory)",
    ),
    (
        "cylinder-zukauskas",
        {"Re": 1e4, "Pr": 0.7},
        0.26 * 1e4**0.6 * 0.7**0.37,
        f"{INC} Table 7.4 (from memory)",
    ),
    (
        "cylinder-zukauskas",
        {"Re": 1e4, "Pr": 20.0},
        0.26 * 1e4**0.6 * 20.0**0.36,
        f"{INC} Table 7.4 (from memory)",
    ),
    ("sphere-ranz-marshall", {"Re": 100.0, "Pr": 0.7}, 2 + 0.6 * 10 * 0.7 ** (1 / 3), f"{INC} Eq. 7.57"),
    (
        "sphere-froessling",
        {"Re": 100.0, "Pr": 2.0},
        2 + 0.552 * 10 * 2 ** (1 / 3),
        "Treybal 3rd ed. Table 3.3",
    ),
    (
        "sphere-whitaker",
        {"Re": 1e3, "Pr": 0.71},
        2 + (0.4 * 1e3**0.5 + 0.06 * 1e3 ** (2 / 3)) * 0.71**0.4,
        f"{INC} Eq. 7.56",
    ),
    (
        "sphere-creeping-rigid",
        {"Re": 0.1, "Pr": 1000.0},
        1 + (1 + 100.0) ** (1 / 3),
        "Clift et al. 1978 Eq. 3-49",
    ),
    (
        "drop-creeping-mobile",
        {"Re": 0.1, "Pr": 1000.0},
        1 + (1 + 0.564 * 100.0 ** (2 / 3)) ** 0.75,
        "Clift et al. 1978 Eq. 3-50",
    ),
    (
        "bubble-mobile-potential-flow",
        {"Re": 400.0, "Pr": 500.0},
        2 / pi**0.5 * (2e5) ** 0.5,
        "Boussinesq 1905",
    ),
    ("duct-laminar-constant-wall", {"Re": 1000.0, "Pr": 5.0}, 3.66, f"{INC} Eq. 8.55 (Graetz)"),
    ("duct-laminar-constant-flux", {"Re": 1000.0, "Pr": 5.0}, 4.36, f"{INC} Eq. 8.53"),
    (
        "duct-entry-hausen",
        {"Re": 1000.0, "Pr": 5.0, "L_over_d": 100.0},
        3.66 + 0.0668 * 50 / (1 + 0.04 * 50 ** (2 / 3)),
        f"{INC} Eq. 8.57",
    ),
    (
        "duct-entry-graetz-leveque",
        {"Re": 1000.0, "Pr": 5.0, "L_over_d": 10.0},
        (3.66**3 + 0.7**3 + (1.615 * 500 ** (1 / 3) - 0.7) ** 3) ** (1 / 3),
        "VDI Heat Atlas G1 Eq. 12 (from memory)",
    ),
    (
        "duct-entry-sieder-tate-laminar",
        {"Re": 1000.0, "Pr": 5.0, "L_over_d": 10.0},
        1.86 * 500 ** (1 / 3),
        f"{INC} Eq. 8.58",
    ),
    ("duct-dittus-boelter", {"Re": 5e4, "Pr": 3.0}, 0.023 * 5e4**0.8 * 3.0**0.4, f"{INC} Eq. 8.60"),
    (
        "duct-dittus-boelter",
        {"Re": 5e4, "Pr": 3.0, "heating": 0.0},
        0.023 * 5e4**0.8 * 3.0**0.3,
        f"{INC} Eq. 8.60",
    ),
    (
        "duct-sieder-tate",
        {"Re": 5e4, "Pr": 3.0, "mu_ratio": 2.0},
        0.027 * 5e4**0.8 * 3 ** (1 / 3) * 2**0.14,
        f"{INC} Eq. 8.61",
    ),
    (
        "duct-gnielinski",
        {"Re": 5e4, "Pr": 3.0},
        (f_p := (0.790 * math.log(5e4) - 1.64) ** -2)
        / 8
        * (5e4 - 1000)
        * 3.0
        / (1 + 12.7 * (f_p / 8) ** 0.5 * (3.0 ** (2 / 3) - 1)),
        f"{INC} Eqs. 8.62 and 8.21 (Petukhov's friction factor)",
    ),
    (
        "duct-gnielinski",
        {"Re": 5e4, "Pr": 3.0, "d_over_L": 0.05, "Pr_ratio": 2.0},
        (f_p := (0.790 * math.log(5e4) - 1.64) ** -2)
        / 8
        * (5e4 - 1000)
        * 3.0
        / (1 + 12.7 * (f_p / 8) ** 0.5 * (3.0 ** (2 / 3) - 1))
        * (1 + 0.05 ** (2 / 3))
        * 2.0**0.11,
        "VDI Heat Atlas 2nd ed. G1 Eqs. 27-29 (from memory)",
    ),
    (
        "duct-linton-sherwood",
        {"Re": 1e4, "Pr": 1500.0},
        0.023 * 1e4**0.83 * 1500 ** (1 / 3),
        "Treybal Table 3.3",
    ),
    ("wetted-wall-gilliland-sherwood", {"Re": 1e4, "Pr": 1.0}, 0.023 * 1e4**0.83, "Treybal Table 3.3"),
    ("packed-bed-wakao-funazkri", {"Re": 100.0, "Pr": 1.0}, 2 + 1.1 * 100**0.6, "Wakao & Funazkri 1978"),
    (
        "packed-bed-wilson-geankoplis",
        {"Re": 10.0, "Pr": 1000.0, "porosity": 0.4},
        1.09 / 0.4 * 10 ** (1 / 3) * 10.0,
        "Geankoplis 3rd ed. Eq. 7.3-36",
    ),
    (
        "packed-bed-wilson-geankoplis",
        {"Re": 100.0, "Pr": 1000.0, "porosity": 0.4},
        0.25 / 0.4 * 100**0.69 * 10.0,
        "Geankoplis 3rd ed. Eq. 7.3-37",
    ),
    (
        "packed-bed-gupta-thodos",
        {"Re": 100.0, "Pr": 1.0, "porosity": 0.4},
        (0.010 + 0.863 / (100**0.58 - 0.483)) / 0.4 * 100,
        "Gupta & Thodos 1963",
    ),
    (
        "vertical-plate-churchill-chu",
        {"Ra": 1e10, "Pr": 0.7},
        (0.825 + 0.387 * 1e10 ** (1 / 6) / (1 + (0.492 / 0.7) ** (9 / 16)) ** (8 / 27)) ** 2,
        f"{INC} Eq. 9.26",
    ),
    (
        "vertical-plate-churchill-chu-laminar",
        {"Ra": 1e8, "Pr": 0.7},
        0.68 + 0.670 * 1e2 / (1 + (0.492 / 0.7) ** (9 / 16)) ** (4 / 9),
        f"{INC} Eq. 9.27",
    ),
    ("horizontal-plate-upper-hot", {"Ra": 1e6, "Pr": 0.7}, 0.54 * 1e6**0.25, f"{INC} Eq. 9.30"),
    ("horizontal-plate-upper-hot", {"Ra": 1e9, "Pr": 0.7}, 0.15 * 1e3, f"{INC} Eq. 9.31"),
    (
        "horizontal-plate-lower-hot",
        {"Ra": 1e6, "Pr": 0.7},
        0.52 * 1e6**0.2,
        "Incropera 7th ed. Eq. 9.32 (from memory)",
    ),
    (
        "horizontal-cylinder-churchill-chu",
        {"Ra": 1e6, "Pr": 0.7},
        (0.60 + 0.387 * 10 / (1 + (0.559 / 0.7) ** (9 / 16)) ** (8 / 27)) ** 2,
        f"{INC} Eq. 9.34",
    ),
    (
        "sphere-free-churchill",
        {"Ra": 1e6, "Pr": 0.7},
        2 + 0.589 * 1e6**0.25 / (1 + (0.469 / 0.7) ** (9 / 16)) ** (4 / 9),
        f"{INC} Eq. 9.35",
    ),
    ("penetration-higbie", {"Re": 100.0, "Pr": 500.0}, 2 / pi**0.5 * (5e4) ** 0.5, "Higbie 1935"),
    ("surface-renewal-danckwerts", {"renewal": 400.0}, 20.0, "Danckwerts 1951"),
    ("falling-film-short-contact", {"Re": 100.0, "Pr": 500.0}, (6 / pi * 5e4) ** 0.5, "BSL 2nd ed. 18.5"),
    ("falling-film-long-contact", {"Re": 100.0, "Pr": 500.0}, 3.41, "Emmert & Pigford 1954"),
    ("rotating-disk-levich", {"Re": 1e4, "Pr": 1000.0}, 0.62 * 100 * 10.0, "Levich 1962"),
    (
        "stirred-vessel-calderbank-small-bubbles",
        {"Ar": 1e4, "Pr": 500.0},
        0.31 * (1e4 * 500) ** (1 / 3),
        "Calderbank & Moo-Young 1961",
    ),
    (
        "stirred-vessel-calderbank-large-bubbles",
        {"Ar": 1e5, "Pr": 500.0},
        0.42 * 1e5 ** (1 / 3) * 500**0.5,
        "Calderbank & Moo-Young 1961",
    ),
    # additions: tube banks, jets, annuli and non-circular ducts, transitional flow, drops,
    # liquid spheres, rotating bodies, enclosures, mixed convection (each equation written out)
    (
        "tube-bank-inline-zukauskas",
        {"Re": 1e4, "Pr": 0.7, "rows": 5.0},
        0.92 * 0.27 * 1e4**0.63 * 0.7**0.36,
        f"{INC} Eq. 7.58, Tables 7.5-7.6 (from memory)",
    ),
    (
        "tube-bank-inline-zukauskas",
        {"Re": 50.0, "Pr": 0.7},
        0.80 * 50**0.40 * 0.7**0.36,
        f"{INC} Table 7.5 (from memory)",
    ),
    (
        "tube-bank-staggered-zukauskas",
        {"Re": 1e4, "Pr": 0.7, "ST_over_SL": 1.5, "rows": 3.0},
        0.84 * 0.35 * 1.5**0.2 * 1e4**0.6 * 0.7**0.36,
        f"{INC} Eq. 7.58, Tables 7.5-7.6 (from memory)",
    ),
    (
        "tube-bank-staggered-zukauskas",
        {"Re": 1e4, "Pr": 0.7, "ST_over_SL": 3.0, "Pr_ratio": 2.0},
        0.40 * 1e4**0.6 * 0.7**0.36 * 2.0**0.25,
        f"{INC} Table 7.5 (from memory)",
    ),
    (
        "jet-round-martin",
        {"Re": 2e4, "Pr": 0.7, "H_over_d": 5.0, "area_ratio": 0.01},
        2
        * 0.1
        * (1 - 0.22)
        / (1 + 0.2 * (5 - 6) * 0.1)
        * 2
        * 2e4**0.5
        * (1 + 0.005 * 2e4**0.55) ** 0.5
        * 0.7**0.42,
        f"{INC} Eqs. 7.79-7.80 (from memory); Martin 1977",
    ),
    (
        "jet-slot-martin",
        {"Re": 1e4, "Pr": 0.7, "H_over_W": 5.0, "area_ratio": 0.05},
        3.06 / (10 + 5 + 2.78) * 1e4 ** (0.695 - 1 / (5 + 2.5**1.33 + 3.06)) * 0.7**0.42,
        f"{INC} Eqs. 7.83-7.84 (from memory); Martin 1977",
    ),
    ("annulus-laminar-inner-wall", {"Re": 1000.0, "Pr": 5.0, "di_over_do": 0.25}, 7.37, f"{INC} Table 8.2"),
    ("annulus-laminar-outer-wall", {"Re": 1000.0, "Pr": 5.0, "di_over_do": 0.5}, 4.43, f"{INC} Table 8.2"),
    (
        "rectangular-duct-laminar-constant-wall",
        {"Re": 1000.0, "Pr": 5.0, "aspect_ratio": 0.5},
        3.39,
        f"{INC} Table 8.1 (b/a = 2)",
    ),
    (
        "rectangular-duct-laminar-constant-flux",
        {"Re": 1000.0, "Pr": 5.0, "aspect_ratio": 0.25},
        5.33,
        f"{INC} Table 8.1 (b/a = 4)",
    ),
    (
        "noncircular-duct-turbulent-gnielinski",
        {"Re": 2e4, "Pr": 0.7},
        (f_p := (0.790 * math.log(2e4) - 1.64) ** -2)
        / 8
        * (2e4 - 1000)
        * 0.7
        / (1 + 12.7 * (f_p / 8) ** 0.5 * (0.7 ** (2 / 3) - 1)),
        f"{INC} Eq. 8.62 on the hydraulic diameter",
    ),
    (
        "duct-transitional-gnielinski",
        {"Re": 5000.0, "Pr": 5.0, "d_over_L": 0.01},
        (1 - 2700 / 7700)
        * (
            3.66**3
            + 0.7**3
            + (1.615 * (2300 * 5 * 0.01) ** (1 / 3) - 0.7) ** 3
            + ((2 / (1 + 22 * 5)) ** (1 / 6) * (2300 * 5 * 0.01) ** 0.5) ** 3
        )
        ** (1 / 3)
        + 2700
        / 7700
        * (
            (xi := (1.8 * math.log10(1e4) - 1.5) ** -2)
            / 8
            * 1e4
            * 5.0
            / (1 + 12.7 * (xi / 8) ** 0.5 * (5.0 ** (2 / 3) - 1))
            * (1 + 0.01 ** (2 / 3))
        ),
        "Gnielinski 2013 Eqs. 5-7; VDI Heat Atlas G1 (from memory)",
    ),
    (
        "drop-creeping-circulating",
        {"Re": 0.1, "Pr": 1e4, "viscosity_ratio": 1.0},
        (4 / (3 * pi)) ** 0.5 * (1e3 / 2) ** 0.5,
        "Levich 1962; Clift et al. 1978 Eq. 3-47 (from memory)",
    ),
    ("drop-inside-rigid-newman", {"Re": 10.0, "Pr": 500.0}, 2 * pi**2 / 3, "Newman 1931; Crank Eq. 6.20"),
    (
        "drop-inside-circulating-kronig-brink",
        {"Re": 0.1, "Pr": 500.0},
        17.66,
        "Kronig & Brink 1950 (from memory)",
    ),
    (
        "drop-inside-oscillating-handlos-baron",
        {"Re": 100.0, "Pr": 1000.0, "viscosity_ratio": 0.5},
        0.00375 * 1e5 / 1.5,
        "Handlos & Baron 1957 (from memory)",
    ),
    (
        "sphere-creeping-high-peclet",
        {"Re": 0.5, "Pr": 2000.0},
        0.991 * 1000 ** (1 / 3) + 0.922,
        "Acrivos & Goddard 1965 (from memory)",
    ),
    (
        "sphere-liquid-clift",
        {"Re": 20.0, "Pr": 500.0},
        1 + (1 + 1 / 1e4) ** (1 / 3) * 20**0.41 * 500 ** (1 / 3),
        "Clift et al. 1978 Eq. 5-25 (from memory)",
    ),
    (
        "sphere-liquid-clift",
        {"Re": 500.0, "Pr": 500.0},
        1 + 0.752 * 500**0.472 * 500 ** (1 / 3),
        "Clift et al. 1978 Eq. 5-26 (from memory)",
    ),
    (
        "rotating-disk-newman",
        {"Re": 1e4, "Pr": 1000.0},
        0.62048 * 100 * 10 / (1 + 0.2980 / 10 + 0.14514 / 100),
        "Newman 1966 (from memory)",
    ),
    (
        "rotating-cylinder-eisenberg-tobias-wilke",
        {"Re": 1e4, "Pr": 1000.0},
        0.0791 * 1e4**0.70 * 1000**0.356,
        "Eisenberg, Tobias & Wilke 1954 (from memory)",
    ),
    (
        "enclosure-horizontal-globe-dropkin",
        {"Ra": 1e6, "Pr": 0.7},
        0.069 * 100 * 0.7**0.074,
        f"{INC} Eq. 9.49 (from memory)",
    ),
    (
        "enclosure-vertical-catton",
        {"Ra": 1e6, "Pr": 0.7, "H_over_L": 5.0},
        0.22 * (0.7 / 0.9 * 1e6) ** 0.28 * 5**-0.25,
        f"{INC} Eq. 9.50 (from memory)",
    ),
    (
        "enclosure-vertical-catton-square",
        {"Ra": 1e6, "Pr": 0.7},
        0.18 * (0.7 / 0.9 * 1e6) ** 0.29,
        f"{INC} Eq. 9.51 (from memory)",
    ),
    (
        "enclosure-vertical-macgregor-emery",
        {"Ra": 1e6, "Pr": 5.0, "H_over_L": 20.0},
        0.42 * 1e6**0.25 * 5**0.012 * 20**-0.3,
        f"{INC} Eq. 9.52 (from memory)",
    ),
    (
        "vertical-plate-mixed-churchill",
        {"Re": 1e4, "Pr": 0.7, "Ra": 1e8},
        (
            (0.664 * 100 * 0.7 ** (1 / 3)) ** 3
            + ((0.825 + 0.387 * 1e8 ** (1 / 6) / (1 + (0.492 / 0.7) ** (9 / 16)) ** (8 / 27)) ** 2) ** 3
        )
        ** (1 / 3),
        f"{INC} Eqs. 9.56, 7.30, 9.26 (Churchill 1977, from memory)",
    ),
]


@pytest.mark.parametrize(
    ("slug", "inputs", "expected", "source"), _POINTS, ids=[f"{p[0]}-{i}" for i, p in enumerate(_POINTS)]
)
def test_record_against_published_equation(slug, inputs, expected, source):
    rec = cat.correlation(slug)
    rel = 2e-4 if slug == "flat-plate-mixed-average" else 1e-10  # the book rounds A to 871
    assert rec.nusselt(**inputs) == pytest.approx(expected, rel=rel), source
    mass = {("Sc" if k == "Pr" else k): v for k, v in inputs.items()}
    assert rec.sherwood(**mass) == pytest.approx(expected, rel=rel), source


def test_every_record_has_a_published_point():
    assert {p[0] for p in _POINTS} == {r.slug for r in cat.all_correlations()}


def test_catalogue_size_and_metadata():
    recs = cat.all_correlations()
    assert len(recs) >= 30
    for r in recs:
        assert r.reference
        assert r.envelope
        assert r.accuracy
        assert r.length
        assert r.boundary
        assert r.fitted_on in ("heat", "mass", "both")
        assert set(r.envelope) <= set(r.inputs) | set(r.parameters)


def test_gnielinski_rough_tube_uses_colebrook_friction_from_fluids():
    # rough tubes: Eq. 8.62 with the Colebrook friction factor (Incropera Section 8.5 allows the Moody
    # value); fluids.friction.Clamond solves Colebrook (Clamond 2009)
    from fluids.friction import Clamond

    Re, Pr, eD = 5e4, 3.0, 1e-3
    f = Clamond(Re, eD)
    expected = (f / 8) * (Re - 1000) * Pr / (1 + 12.7 * (f / 8) ** 0.5 * (Pr ** (2 / 3) - 1))
    rec = cat.correlation("duct-gnielinski")
    assert rec.nusselt(Re=Re, Pr=Pr, roughness=eD) == pytest.approx(expected, rel=1e-9)
    assert rec.nusselt(Re=Re, Pr=Pr, roughness=eD) > rec.nusselt(Re=Re, Pr=Pr)  # roughness raises transfer


def test_numpy_colebrook_matches_fluids():
    from fluids.friction import Clamond

    from masstransfer.surface._catalogue import _darcy_colebrook

    Re = np.geomspace(3e3, 1e8, 13)[:, None]
    eD = np.array([0.0, 1e-6, 1e-4, 1e-2, 0.05])[None, :]
    expected = np.array([[Clamond(r, e) for e in eD[0]] for r in Re[:, 0]])
    assert _darcy_colebrook(Re, eD) == pytest.approx(expected, rel=1e-12)


def test_gnielinski_refuses_a_negative_nusselt_number():
    # below Re ~ 2300 with a tiny Pr the denominator of Eq. 8.62 changes sign
    rec = cat.correlation("duct-gnielinski")
    with _quiet(), pytest.raises(mt.errors.InputValueError, match=r"Re=1500\.0 with Pr=0\.01"):
        rec.nusselt(Re=1500.0, Pr=0.01)


def test_friction_interpolant_matches_fluids():
    from fluids.friction import Clamond

    Re = np.geomspace(1.2e3, 9e8, 41)
    expected = np.array([Clamond(r, 0.0) for r in Re])
    assert cat.darcy_friction_smooth(Re) == pytest.approx(expected, rel=1e-9)


# --- limits ----------------------------------------------------------------------


@pytest.mark.parametrize("slug", ["sphere-ranz-marshall", "sphere-creeping-rigid", "drop-creeping-mobile"])
def test_sphere_sherwood_tends_to_two_at_zero_flow(slug):
    # diffusion from a sphere into a quiescent fluid: Sh = 2 (Bird, Stewart & Lightfoot 2nd ed. 22.2)
    assert cat.correlation(slug).sherwood(Re=1e-12, Sc=1.0) == pytest.approx(2.0, abs=1e-3)


def test_sphere_limits_for_records_with_a_lower_re_bound():
    # Froessling and Whitaker are 2 + terms in Re: Re -> 0 gives 2 (outside their envelopes, so a warning)
    for slug in ("sphere-froessling", "sphere-whitaker"):
        with pytest.warns(mt.errors.EnvelopeWarning):
            assert cat.correlation(slug).sherwood(Re=1e-14, Sc=1.0) == pytest.approx(2.0, abs=1e-6)
    assert cat.correlation("sphere-free-churchill").sherwood(Ra=0.0, Sc=1.0) == pytest.approx(2.0)


def test_laminar_duct_values():
    # Graetz (constant wall) 3.66 and constant flux 4.36 (Incropera Eqs. 8.53, 8.55; published)
    assert cat.correlation("duct-laminar-constant-wall").nusselt(Re=500.0, Pr=0.7) == pytest.approx(3.66)
    assert cat.correlation("duct-laminar-constant-flux").sherwood(Re=500.0, Sc=600.0) == pytest.approx(4.36)


@pytest.mark.parametrize("slug", ["duct-entry-hausen", "duct-entry-graetz-leveque"])
def test_developing_flow_approaches_fully_developed(slug):
    rec = cat.correlation(slug)
    far = rec.nusselt(Re=500.0, Pr=0.7, L_over_d=1e7)
    assert far == pytest.approx(3.66, rel=1e-3)
    near = rec.nusselt(Re=500.0, Pr=0.7, L_over_d=np.array([1.0, 10.0, 100.0, 1000.0]))
    assert np.all(np.diff(near) < 0)


def test_unheated_length_zero_recovers_flat_plate():
    a = cat.correlation("flat-plate-unheated-start-laminar").nusselt(Re=1e5, Pr=0.7, xi_over_x=0.0)
    assert a == pytest.approx(cat.correlation("flat-plate-laminar-local").nusselt(Re=1e5, Pr=0.7))


def test_mixed_plate_is_laminar_below_transition_and_continuous_at_it():
    rec = cat.correlation("flat-plate-mixed-average")
    Re = np.array([1e4, 4.99999e5, 5.00001e5, 1e6])
    nu = rec.nusselt(Re=Re, Pr=0.7)
    lam = cat.correlation("flat-plate-laminar-average").nusselt(Re=Re[:2], Pr=0.7)
    assert nu[:2] == pytest.approx(lam)
    assert nu[2] == pytest.approx(nu[1], rel=1e-4)  # A = 871 makes the form continuous at Re_c
    lower = rec.nusselt(Re=1e6, Pr=0.7, Re_c=3e5)
    assert lower > nu[3]  # earlier transition, more turbulent length, more transfer


def test_gnielinski_vs_dittus_boelter():
    # Incropera & DeWitt Section 8.5: Dittus-Boelter errors up to 25 %, Gnielinski about 10 %;
    # so the two agree within 25 % over Re 1e4-1e5, Pr 0.7-10
    Re = np.geomspace(1e4, 1e5, 9)[:, None]
    Pr = np.geomspace(0.7, 10.0, 7)[None, :]
    g = cat.correlation("duct-gnielinski").nusselt(Re=Re, Pr=Pr)
    d = cat.correlation("duct-dittus-boelter").nusselt(Re=Re, Pr=Pr)
    assert np.all(np.abs(d / g - 1) < 0.25)


def test_ranz_marshall_vs_whitaker_in_overlap():
    # both for spheres in gases; agree within their stated 30 % in Re 10-200 (common practice)
    Re = np.linspace(10.0, 200.0, 20)
    a = cat.correlation("sphere-ranz-marshall").nusselt(Re=Re, Pr=0.7)
    b = cat.correlation("sphere-whitaker").nusselt(Re=Re, Pr=0.71)
    assert np.all(np.abs(a / b - 1) < 0.3)


# --- envelope policy and metadata -----------------------------------------------------


def test_leaving_envelope_warns_naming_record_input_value_and_range():
    rec = cat.correlation("sphere-whitaker")
    with pytest.warns(mt.errors.EnvelopeWarning, match=r"sphere-whitaker.*Re=1\.0.*3\.5 to 76000"):
        rec.nusselt(Re=1.0, Pr=0.71)
    with pytest.raises(mt.errors.EnvelopeError, match="sphere-whitaker"):
        rec.nusselt(Re=1.0, Pr=0.71, strict=True)


def test_warning_points_at_the_caller():
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        cat.correlation("sphere-whitaker").sherwood(Re=1.0, Sc=0.9)
    assert caught[0].filename == __file__


def test_analogy_is_recorded_in_metadata():
    heat_fitted = cat.correlation("duct-gnielinski").evaluate("mass", Re=1e4, Sc=1.0)
    assert heat_fitted.quantity == "Sh"
    assert "fitted on heat" in heat_fitted.analogy
    mass_fitted = cat.correlation("duct-linton-sherwood").evaluate("heat", Re=1e4, Pr=1500.0)
    assert "fitted on mass" in mass_fitted.analogy
    both = cat.correlation("sphere-ranz-marshall").evaluate("mass", Re=10.0, Sc=1.0)
    assert both.analogy is None
    assert both.inputs == {"Re": 10.0, "Sc": 1.0}


def test_array_call_spanning_regimes_warns_once_with_count():
    rec = cat.correlation("cylinder-hilpert")
    with pytest.warns(mt.errors.EnvelopeWarning, match=r"and 1 more"):
        out = rec.nusselt(Re=np.array([0.1, 0.2, 10.0, 1e3, 1e5]), Pr=0.7)
    assert out.shape == (5,)


# --- look-up and find ------------------------------------------------------------------


def test_get_unknown_slug_lists_close_matches():
    with pytest.raises(mt.errors.UnknownMethodError, match="sphere-ranz-marshall"):
        cat.correlation("sphere-ranz-marshal")


def test_find_ranks_and_filters():
    found = [r.slug for r in cat.find_correlations("sphere", Re=100.0, Sc=1.5)]
    assert found[0] == "sphere-froessling"  # fitted on mass, covers Sc 1.5
    assert "sphere-whitaker" in found
    assert "sphere-creeping-rigid" not in found  # Re 100 is outside creeping flow
    turbulent_plate = [r.slug for r in cat.find_correlations("flat plate", Re=2e6, Pr=0.7)]
    assert "flat-plate-laminar-local" not in turbulent_plate
    assert "flat-plate-mixed-average" in turbulent_plate
    free = [r.slug for r in cat.find_correlations("vertical plate", Ra=1e10, Pr=0.7)]
    assert free == [
        "vertical-plate-churchill-chu",
        "vertical-plate-mixed-churchill",
    ]  # the mixed one needs Re
    with pytest.raises(mt.errors.UnknownMethodError, match="did you mean"):
        cat.find_correlations("spher", Re=1.0)


# --- bad input --------------------------------------------------------------------------


@pytest.mark.parametrize("bad", [-1.0, float("nan"), float("inf")])
def test_bad_inputs_name_the_argument(bad):
    with pytest.raises(mt.errors.InputValueError, match="Re"):
        cat.correlation("sphere-ranz-marshall").nusselt(Re=bad, Pr=0.7)
    with pytest.raises(mt.errors.InputValueError, match="Sc"):
        cat.correlation("sphere-ranz-marshall").sherwood(Re=10.0, Sc=bad)


def test_unused_or_missing_inputs_are_errors():
    rec = cat.correlation("sphere-ranz-marshall")
    with pytest.raises(mt.errors.InputValueError, match=r"does not use 'Pr'.*pass Sc"):
        rec.sherwood(Re=10.0, Pr=0.7)
    with pytest.raises(mt.errors.InputValueError, match="does not use 'L_over_d'"):
        rec.nusselt(Re=10.0, Pr=0.7, L_over_d=3.0)
    with pytest.raises(mt.errors.InputValueError, match="needs L_over_d"):
        cat.correlation("duct-entry-hausen").nusselt(Re=100.0, Pr=0.7)
    with pytest.raises(mt.errors.InputValueError, match="broadcast"):
        rec.nusselt(Re=np.ones(3), Pr=np.ones(2))


def test_a_parameter_name_of_earlier_versions_names_its_successor():
    with pytest.raises(mt.errors.InputValueError, match="L_over_D is now L_over_d"):
        cat.correlation("duct-entry-hausen").nusselt(Re=100.0, Pr=0.7, L_over_D=20.0)


@pytest.mark.parametrize("rec", cat.all_correlations(), ids=lambda r: r.slug)
def test_no_record_writes_D_for_a_diameter(rec):
    # D is only ever a diffusivity (DEVELOPERS.md vocabulary); a diameter is d (Sh = k_c L/D stays)
    texts = " ".join(str(t) for t in (rec.length, rec.notes, rec.accuracy, rec.title))
    assert re.search(r"diameter D\b|\bD/L\b|\bL/D\s*[<>=]|e/D\b|\bD_[io]\b", texts) is None
    for name in (*rec.parameters, *rec.envelope, *rec.domain):
        assert re.search(r"(^|_)D(_|$)|^D[a-z]_|_D[a-z]$", name) is None, name


# --- invariants ---------------------------------------------------------------------------

_RE_RECORDS = [r for r in cat.all_correlations() if "Re" in r.inputs]


def _inside(rec, name, draw_fraction):
    lo, hi = rec.envelope.get(name, (0.0, math.inf))
    lo_d, _ = rec.domain.get(name, (0.0, math.inf))
    lo = max(lo, lo_d, 1e-3)
    hi = min(hi, 1e7)
    value = math.exp(math.log(lo) + draw_fraction * (math.log(hi) - math.log(lo)))
    return min(max(value, lo), hi)


_DEFAULTS = {
    "L_over_d": 20.0,
    "xi_over_x": 0.3,
    "porosity": 0.4,
    "H_over_d": 6.0,
    "area_ratio": 0.01,
    "H_over_W": 5.0,
    "di_over_do": 0.5,
    "aspect_ratio": 0.5,
    "viscosity_ratio": 1.0,
    "ST_over_SL": 1.0,
    "H_over_L": 5.0,
}


def _params(rec):
    return {k: _DEFAULTS[k] for k, v in rec.parameters.items() if v is None}


def _quiet():
    ctx = warnings.catch_warnings()
    ctx.__enter__()
    warnings.simplefilter("ignore", mt.errors.EnvelopeWarning)
    return _Exit(ctx)


class _Exit:
    def __init__(self, ctx):
        self.ctx = ctx

    def __enter__(self):
        return self

    def __exit__(self, *exc):
        self.ctx.__exit__(*exc)
        return False


def _straddles_a_drop(rec, name, lo, hi):
    return any(k == name and lo < x <= hi and pct < 0 for k, x, pct in rec.steps)


@given(rec=st.sampled_from(_RE_RECORDS), a=st.floats(0.0, 1.0), b=st.floats(0.0, 1.0), c=st.floats(0.0, 1.0))
def test_increases_with_reynolds_inside_envelope(rec, a, b, c):
    lo_f, hi_f = sorted((a, b))
    Re1, Re2 = _inside(rec, "Re", lo_f), _inside(rec, "Re", hi_f)
    others = {k: _inside(rec, k, c) for k in rec.inputs if k != "Re"}
    if _straddles_a_drop(rec, "Re", Re1, Re2):
        return  # a documented step down between the two (test_regime_switches_are_documented)
    with _quiet():  # conditions on products of inputs may be left; the invariant holds regardless
        n1 = rec.nusselt(Re=Re1, **others, **_params(rec))
        n2 = rec.nusselt(Re=Re2, **others, **_params(rec))
    assert n2 >= n1 * (1 - 1e-12)


@given(rec=st.sampled_from(list(cat.all_correlations())), a=st.floats(0.0, 1.0), c=st.floats(0.0, 1.0))
def test_nusselt_equals_sherwood_when_pr_equals_sc(rec, a, c):
    heat = {k: _inside(rec, k, a if k != "Pr" else c) for k in rec.inputs}
    mass = {("Sc" if k == "Pr" else k): v for k, v in heat.items()}
    with _quiet():
        assert rec.nusselt(**heat, **_params(rec)) == rec.sherwood(**mass, **_params(rec))


@given(
    rec=st.sampled_from(list(cat.all_correlations())),
    fr=st.lists(st.floats(0.0, 1.0), min_size=1, max_size=6),
    c=st.floats(0.0, 1.0),
)
def test_scalar_and_array_calls_agree(rec, fr, c):
    first = rec.inputs[0]
    others = {k: _inside(rec, k, c) for k in rec.inputs[1:]}
    xs = np.array([_inside(rec, first, f) for f in fr])
    with _quiet():
        arr = rec.nusselt(**{first: xs}, **others, **_params(rec))
        assert isinstance(arr, np.ndarray)
        for x, v in zip(xs, arr, strict=True):
            s = rec.nusselt(**{first: float(x)}, **others, **_params(rec))
            assert isinstance(s, float)
            assert s == pytest.approx(v, rel=1e-12)


# --- regime switches ---------------------------------------------------------------------------


def _scan_jumps(rec, name, base):
    """Find jumps of more than 0.5 % along ``name`` (bisected to the switch), as (value, pct)."""
    lo, hi = rec.envelope.get(name, (0.0, math.inf))
    lo, hi = max(lo, 1e-3), min(hi, 1e9)
    x = np.geomspace(lo, hi, 4001)
    y = np.log(np.asarray(rec.nusselt(**{**base, name: x}), dtype=float) * np.ones_like(x))
    d2 = np.abs(y[2:] - 2 * y[1:-1] + y[:-2])
    found = []
    for i in np.flatnonzero(d2 > 2e-4):
        a, b = float(x[i]), float(x[i + 2])
        for _ in range(60):
            m = math.sqrt(a * b)
            fa, fm, fb = (rec.nusselt(**{**base, name: v}) for v in (a, m, b))
            if abs(math.log(fm / fa)) > abs(math.log(fb / fm)):
                b = m
            else:
                a = m
        after = rec.nusselt(**{**base, name: b * (1 + 1e-9)})
        before = rec.nusselt(**{**base, name: a * (1 - 1e-9)})
        pct = 100 * (after / before - 1)
        if abs(pct) > 0.5 and all(abs(m / x0 - 1) > 1e-6 for x0, _ in found):
            found.append((m, pct))
    return found


@pytest.mark.parametrize("rec", list(cat.all_correlations()), ids=lambda r: r.slug)
def test_regime_switches_are_documented(rec):
    # every jump of more than 0.5 % at a regime switch is declared in steps (value and size) and
    # said in the notes; every declared step is there
    base = {}
    for k in rec.inputs:
        lo, hi = rec.envelope.get(k, (0.0, math.inf))
        base[k] = math.sqrt(max(lo, 1e-3) * min(hi, 1e9))
    base.update(_params(rec))
    found = []
    with _quiet():
        for name in rec.inputs:
            found += [(name, x, pct) for x, pct in _scan_jumps(rec, name, base)]
    assert len(found) == len(rec.steps), (found, rec.steps)
    for (name, x, pct), (k, x0, pct0) in zip(sorted(found), sorted(rec.steps), strict=True):
        assert name == k
        assert x == pytest.approx(x0, rel=1e-6)
        assert pct == pytest.approx(pct0, abs=0.1)
    if rec.steps:
        assert "without blending" in rec.notes


# --- conditions and branch envelopes -----------------------------------------------------------


@pytest.mark.parametrize(
    ("slug", "inputs", "label"),
    [
        ("flat-plate-laminar-churchill-ozoe", {"Re": 1e3, "Pr": 0.05}, r"Pe = Re\*Pr = 50\.0.*100 to inf"),
        ("cylinder-churchill-bernstein", {"Re": 0.1, "Pr": 0.5}, r"Pe = Re\*Pr = 0\.05.*0\.2 to inf"),
    ],
)
def test_conditions_in_notes_are_envelope_inputs(slug, inputs, label):
    # Churchill & Ozoe need Re Pr >= 100 (Incropera Eq. 7.46); Churchill & Bernstein Re Pr >= 0.2 (Eq. 7.54)
    rec = cat.correlation(slug)
    with pytest.warns(mt.errors.EnvelopeWarning, match=label):
        rec.nusselt(**inputs)
    with pytest.raises(mt.errors.EnvelopeError, match=label):
        rec.nusselt(strict=True, **inputs)
    mass = {("Sc" if k == "Pr" else k): v for k, v in inputs.items()}
    with pytest.warns(mt.errors.EnvelopeWarning, match=r"Re\*Sc"):
        rec.sherwood(**mass)
    assert rec not in cat.find_correlations(rec.geometry, **inputs)


def test_wilson_geankoplis_branch_envelopes():
    # Wilson & Geankoplis 1966 abstract: Re 0.0016-55 measured for Sc 950-70600; the high branch
    # reaches Sc 165-10690 (Geankoplis 3rd ed., from memory)
    rec = cat.correlation("packed-bed-wilson-geankoplis")
    rec.sherwood(Re=100.0, Sc=500.0, porosity=0.4, strict=True)  # inside the high branch
    with pytest.warns(mt.errors.EnvelopeWarning, match=r"Sc=500\.0.*950 to 70600.*branch 0 <= Re < 55"):
        rec.sherwood(Re=10.0, Sc=500.0, porosity=0.4)
    with pytest.warns(mt.errors.EnvelopeWarning, match=r"and 0 more"):
        rec.sherwood(Re=np.array([10.0, 100.0]), Sc=np.array([500.0, 500.0]), porosity=0.4)
    assert "packed-bed-wilson-geankoplis" not in [r.slug for r in cat.find_correlations(Re=10.0, Sc=500.0)]
    assert rec.outside("mass", Re=10.0, Sc=2000.0, porosity=0.4) == ()


def test_find_returns_a_liquid_sphere_record():
    # a sphere in a liquid at Re 100, Sc 500 (common practice: dissolving particles)
    found = [r.slug for r in cat.find_correlations("sphere", Re=100.0, Sc=500.0)]
    assert "sphere-liquid-clift" in found
    assert "sphere-ranz-marshall" not in found  # gases only (Pr, Sc up to 2.7)
    creeping = [r.slug for r in cat.find_correlations("sphere", Re=0.1, Sc=1e4)]
    assert "sphere-creeping-high-peclet" in creeping


def test_geometries_name_the_additions_in_plain_words():
    names = " | ".join(cat.geometries())
    for word in ("tube bank", "jet", "annulus", "non-circular duct", "rotating cylinder", "enclosure"):
        assert word in names


def test_drop_viscosity_ratio():
    # the clean-bubble record is the ratio-0 case of the circulating-drop one at high Pe (Levich 1962:
    # Sh = (4/(3 pi))^(1/2) (Pe/(1 + kappa))^(1/2)); a ratio of 1 lowers Sh by 2^(1/2)
    mobile = cat.correlation("drop-creeping-mobile").sherwood(Re=0.5, Sc=2e6)
    drop = cat.correlation("drop-creeping-circulating")
    assert drop.sherwood(Re=0.5, Sc=2e6, viscosity_ratio=0.0) == pytest.approx(mobile, rel=2e-3)
    assert mobile / drop.sherwood(Re=0.5, Sc=2e6, viscosity_ratio=1.0) == pytest.approx(2**0.5, rel=2e-3)


def test_tube_bank_row_correction_and_limits():
    # Incropera Table 7.6 (from memory): C2 = 0.70 for one aligned row, 1 from 20 rows on
    rec = cat.correlation("tube-bank-inline-zukauskas")
    one = rec.nusselt(Re=1e4, Pr=0.7, rows=1.0)
    many = rec.nusselt(Re=1e4, Pr=0.7, rows=40.0)
    assert one / many == pytest.approx(0.70)
    assert rec.nusselt(Re=1e4, Pr=0.7) == many  # 20 rows by default
    with pytest.raises(mt.errors.InputValueError, match="rows"):
        rec.nusselt(Re=1e4, Pr=0.7, rows=0.5)


# --- stated accuracy against the source's more exact reference forms, at the envelope's edges ----


@functools.lru_cache(maxsize=1)
def _blasius():
    """Solve Blasius' f''' + f f''/2 = 0 by shooting (scipy), with the running integral of f."""
    from scipy.integrate import solve_ivp
    from scipy.optimize import brentq

    def run(s):
        return solve_ivp(
            lambda t, y: [y[1], y[2], -0.5 * y[0] * y[2], y[0]],
            (0.0, 20.0),
            [0.0, 0.0, s, 0.0],
            rtol=1e-12,
            atol=1e-14,
            dense_output=True,
        )

    s = brentq(lambda s: run(s).y[1, -1] - 1.0, 0.3, 0.36, xtol=1e-14)
    return run(s)


def _pohlhausen(Pr):
    """Local Nu_x / Re_x^(1/2) of the laminar plate, exact: 1 / int_0^inf exp(-Pr/2 int_0^eta f) d eta.

    Pohlhausen (1921), Z. angew. Math. Mech. 1, 115; Schlichting, Boundary-Layer Theory, ch. 12 (the
    similarity solution, computed here with scipy); beyond eta = 20, f = eta - beta to double precision.
    """
    from scipy.integrate import quad
    from scipy.special import erfc

    sol = _blasius()
    beta, g20 = 20.0 - sol.y[0, -1], sol.y[3, -1]
    body = quad(
        lambda e: math.exp(-Pr / 2 * sol.sol(e)[3]), 0, 20, limit=400, epsrel=1e-12, points=[0.1, 1, 5]
    )[0]
    tail = (
        math.exp(-Pr / 2 * g20 + Pr / 4 * (20 - beta) ** 2)
        * math.sqrt(math.pi / Pr)
        * erfc(math.sqrt(Pr) / 2 * (20 - beta))
    )
    return 1.0 / (body + tail)


def _graetz_constant_wall():
    """Return the exact fully developed Nu at constant wall temperature, lambda^2/2.

    lambda is the first root of M(1/2 - lambda/4, 1, lambda) (Graetz 1885; Shah & London 1978,
    Section V; scipy.special.hyp1f1).
    """
    from scipy.optimize import brentq
    from scipy.special import hyp1f1

    lam = brentq(lambda x: hyp1f1(0.5 - x / 4, 1.0, x), 2.0, 3.5, xtol=1e-14)
    return lam**2 / 2


@functools.lru_cache(maxsize=1)
def _graetz_terms(count=30):
    """Eigenvalues, coefficients and bulk weights of the Graetz problem (constant wall temperature,
    parabolic velocity), by shooting on theta'' + theta'/r + lam^2 (1 - r^2) theta = 0 with scipy.

    Graetz (1885); Shah & London (1978), Laminar Flow Forced Convection in Ducts, Section V.B.
    """
    from scipy.integrate import solve_ivp
    from scipy.optimize import brentq

    def shoot(lam, full=False):
        def rhs(r, y):
            th, dth = y[0], y[1]
            w = r * (1 - r * r) * th
            return [dth, -dth / r - lam**2 * (1 - r * r) * th, w, w * th]

        r0 = 1e-8
        sol = solve_ivp(
            rhs, (r0, 1.0), [1.0, -0.5 * lam**2 * r0, 0.0, 0.0], rtol=1e-10, atol=1e-12, method="DOP853"
        )
        return sol.y[:, -1] if full else sol.y[0, -1]

    # the n-th eigenvalue lies near 4n + 2.7 (Shah & London 1978, from memory): bracket each one
    lams = [brentq(shoot, 4.0 * n + 1.0, 4.0 * n + 4.5, xtol=1e-12) for n in range(count)]
    terms = []
    for lam in lams:
        _, _, first, second = shoot(lam, full=True)
        terms.append((lam, first / second, first))  # lambda_n, C_n, int r (1 - r^2) theta_n dr
    return tuple(terms)


def _graetz_mean_nusselt(Gz):
    """Mean Nu over a length L at constant wall temperature, Gz = Re Pr D/L: the exact series.

    Bulk temperature 4 sum C_n w_n exp(-lambda_n^2 s) with s = 2/Gz; Nu_m = -ln(theta_b) / (2 s).
    Thirty terms are exact to double precision for Gz <= 1000.
    """
    s = 2.0 / Gz
    theta_b = 4.0 * sum(c * w * math.exp(-lam * lam * s) for lam, c, w in _graetz_terms())
    return -math.log(theta_b) / (2.0 * s)


_EXACT = [
    # (slug, inputs at an envelope edge, exact reference value, source of the reference)
    ("flat-plate-laminar-local", {"Re": 1e5, "Pr": 0.6}, lambda: _pohlhausen(0.6) * 1e5**0.5, "Pohlhausen"),
    ("flat-plate-laminar-local", {"Re": 1e5, "Pr": 1e4}, lambda: _pohlhausen(1e4) * 1e5**0.5, "Pohlhausen"),
    (
        "flat-plate-laminar-average",
        {"Re": 1e5, "Pr": 0.6},
        lambda: 2 * _pohlhausen(0.6) * 1e5**0.5,
        "Pohlhausen, averaged (twice the local value)",
    ),
    (
        "flat-plate-laminar-average",
        {"Re": 1e5, "Pr": 1e4},
        lambda: 2 * _pohlhausen(1e4) * 1e5**0.5,
        "Pohlhausen, averaged (twice the local value)",
    ),
    (
        "flat-plate-laminar-churchill-ozoe",
        {"Re": 1e4, "Pr": 0.01},
        lambda: _pohlhausen(0.01) * 100,
        "Pohlhausen",
    ),
    (
        "flat-plate-laminar-churchill-ozoe",
        {"Re": 1e4, "Pr": 1e4},
        lambda: _pohlhausen(1e4) * 100,
        "Pohlhausen",
    ),
    ("duct-laminar-constant-wall", {"Re": 2300.0, "Pr": 0.7}, _graetz_constant_wall, "Graetz eigenvalue"),
    ("duct-laminar-constant-flux", {"Re": 2300.0, "Pr": 0.7}, lambda: 48 / 11, "Incropera Eq. 8.53 (48/11)"),
    # laminar thermal entry: the Graetz series at Gz = 1 (long tube) and Gz = 1000 (short entry)
    (
        "duct-entry-hausen",
        {"Re": 2000.0, "Pr": 5.0, "L_over_d": 10.0},
        lambda: _graetz_mean_nusselt(1000.0),
        "Graetz series",
    ),
    (
        "duct-entry-hausen",
        {"Re": 100.0, "Pr": 1.0, "L_over_d": 100.0},
        lambda: _graetz_mean_nusselt(1.0),
        "Graetz series",
    ),
    (
        "duct-entry-graetz-leveque",
        {"Re": 2000.0, "Pr": 5.0, "L_over_d": 10.0},
        lambda: _graetz_mean_nusselt(1000.0),
        "Graetz series",
    ),
    (
        "duct-entry-graetz-leveque",
        {"Re": 100.0, "Pr": 1.0, "L_over_d": 100.0},
        lambda: _graetz_mean_nusselt(1.0),
        "Graetz series",
    ),
    # Newman (1966) J. Phys. Chem. 70, 1327, three-term series (from memory); Sc = 100 is the envelope's edge
    (
        "rotating-disk-levich",
        {"Re": 1e4, "Pr": 100.0},
        lambda: 0.62048 * 100 * 100 ** (1 / 3) / (1 + 0.2980 * 100 ** (-1 / 3) + 0.14514 * 100 ** (-2 / 3)),
        "Newman 1966 (from memory)",
    ),
    # clean bubble in creeping flow at Pe -> infinity: Sh = (4/(3 pi))^(1/2) Pe^(1/2) (Levich 1962)
    (
        "drop-creeping-mobile",
        {"Re": 1.0, "Pr": 1e9},
        lambda: (4 / (3 * pi)) ** 0.5 * 1e9**0.5,
        "Levich 1962 thin-layer limit",
    ),
    # rigid sphere, Pe -> infinity: Acrivos & Goddard (1965) Sh = 0.991 Pe^(1/3) + 0.922 (from memory)
    (
        "sphere-creeping-rigid",
        {"Re": 1.0, "Pr": 1e9},
        lambda: 0.991 * 1e9 ** (1 / 3) + 0.922,
        "Acrivos & Goddard 1965 (from memory)",
    ),
    # clean bubble at Re = 100: boundary-layer correction (1 - 2.89 Re^-1/2)^(1/2) (Clift et al. ch. 5,
    # from memory)
    (
        "bubble-mobile-potential-flow",
        {"Re": 100.0, "Pr": 500.0},
        lambda: 2 / pi**0.5 * (1 - 2.89 / 10) ** 0.5 * (5e4) ** 0.5,
        "Clift et al. 1978 ch. 5 (from memory)",
    ),
    ("drop-inside-rigid-newman", {"Re": 1.0, "Pr": 1.0}, lambda: 2 * pi**2 / 3, "Crank Eq. 6.20"),
]


@pytest.mark.parametrize(
    ("slug", "inputs", "exact", "source"), _EXACT, ids=[f"{e[0]}-{i}" for i, e in enumerate(_EXACT)]
)
def test_stated_accuracy_holds_against_the_exact_form_at_the_envelope_edge(slug, inputs, exact, source):
    rec = cat.correlation(slug)
    value = rec.nusselt(strict=True, **inputs)  # inside the envelope
    deviation = abs(value / exact() - 1) * 100
    assert deviation <= rec.accuracy_pct, (
        f"{slug}: {deviation:.2f} % against {source}; claims {rec.accuracy_pct} %"
    )


def test_exact_references_reproduce_the_published_constants():
    # Incropera Eq. 7.23: Nu_x = 0.332 Re^1/2 at Pr = 1; Pr -> inf: 0.3387 Pr^1/3 (Eq. 7.46)
    assert _pohlhausen(1.0) == pytest.approx(0.33206, rel=1e-4)
    assert _pohlhausen(1e4) / 1e4 ** (1 / 3) == pytest.approx(0.3387, rel=2e-3)
    assert _graetz_constant_wall() == pytest.approx(3.6568, rel=1e-4)  # Shah & London 1978 (from memory)
    # first Graetz eigenvalues 2.7044, 6.6790, 10.6734 (Shah & London 1978, from memory); the series
    # tends to 3.66 far downstream (Incropera Eq. 8.55)
    assert [t[0] for t in _graetz_terms()[:3]] == pytest.approx([2.7044, 6.6790, 10.6734], abs=1e-4)
    assert _graetz_mean_nusselt(0.05) == pytest.approx(_graetz_constant_wall(), rel=1e-3)


# --- the scalar fast path changes nothing --------------------------------------------------------


@given(rec=st.sampled_from(list(cat.all_correlations())), a=st.floats(0.0, 1.0), c=st.floats(0.0, 1.0))
def test_scalar_fast_path_equals_the_general_path(rec, a, c):
    heat = {k: _inside(rec, k, a if k != "Pr" else c) for k in rec.inputs}
    heat.update(_params(rec))
    with warnings.catch_warnings(record=True) as fast_caught:
        warnings.simplefilter("always")
        fast = rec.nusselt(**heat)
    with warnings.catch_warnings(record=True) as slow_caught:
        warnings.simplefilter("always")
        slow = rec.evaluate("heat", **heat).value
    assert fast == slow
    assert [str(w.message) for w in fast_caught] == [str(w.message) for w in slow_caught]


@pytest.mark.parametrize(
    "inputs",
    [{"Re": 1.0, "Pr": 0.7}, {"Re": -1.0, "Pr": 0.7}, {"Re": float("nan"), "Pr": 0.7}, {"Re": 10, "Pr": 1}],
)
def test_scalar_fast_path_keeps_errors_and_warnings(inputs):
    rec = cat.correlation("sphere-whitaker")
    outcomes = []
    for call in (lambda: rec.nusselt(**inputs), lambda: rec.evaluate("heat", **inputs).value):
        with warnings.catch_warnings(record=True) as caught:
            warnings.simplefilter("always")
            try:
                outcomes.append(("value", call(), [str(w.message) for w in caught]))
            except mt.errors.MassTransferError as exc:
                outcomes.append((type(exc), str(exc), [str(w.message) for w in caught]))
    assert outcomes[0] == outcomes[1]
