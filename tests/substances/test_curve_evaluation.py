"""PropertyCurve evaluation: the piece-by-piece and in-place paths give the same bits as the plain forms."""

import numpy as np
import pytest
from numpy.polynomial import chebyshev

from masstransfer.substances import PropertyCurve


def _gathered(curve: PropertyCurve, T: np.ndarray) -> np.ndarray:
    """The per-point form: every point's own coefficients, one degree at a time."""
    coef, b = curve.coefficients, curve.breaks
    idx = np.clip(np.searchsorted(b, T, side="right") - 1, 0, coef.shape[0] - 1)
    lo, hi = b[idx], b[idx + 1]
    x = (2.0 * T - (lo + hi)) / (hi - lo)
    b1 = np.zeros_like(x)
    b2 = np.zeros_like(x)
    for j in range(coef.shape[1] - 1, 0, -1):
        b1, b2 = coef[idx, j] + 2.0 * x * b1 - b2, b1
    return np.exp(coef[idx, 0] + x * b1 - b2)


def _curve(pieces: int, width: int, seed: int) -> PropertyCurve:
    rng = np.random.default_rng(seed)
    coef = rng.normal(scale=0.1, size=(pieces, width)) / (1.0 + np.arange(width)) ** 2
    coef[:, 0] += 3.0
    for i in range(pieces):  # pieces fitted with fewer nodes carry zero padding
        coef[i, rng.integers(min(2, width), width + 1) :] = 0.0
    breaks = np.linspace(250.0, 650.0, pieces + 1)
    return PropertyCurve("test property", "Pa", "invented coefficients", 250.0, 650.0, coef, breaks)


@pytest.mark.parametrize("pieces", [2, 4, 8, 9, 40])
@pytest.mark.parametrize("span", [(255.0, 260.0), (260.0, 640.0)])
def test_piecewise_paths_match_the_per_point_form_bit_for_bit(pieces, span):
    curve = _curve(pieces, 48, seed=pieces)
    T = np.linspace(*span, 5001)
    np.testing.assert_array_equal(curve(T), _gathered(curve, T))
    T2 = T[:5000].reshape(50, 100)
    np.testing.assert_array_equal(curve(T2), _gathered(curve, T2.ravel()).reshape(50, 100))


@pytest.mark.parametrize("width", [1, 2, 3, 4, 24, 48])
def test_single_piece_matches_numpy_chebval_bit_for_bit(width):
    curve = _curve(1, width, seed=width)
    T = np.linspace(250.0, 650.0, 3001)
    x = (2.0 * T - (250.0 + 650.0)) / (650.0 - 250.0)
    np.testing.assert_array_equal(curve(T), np.exp(chebyshev.chebval(x, curve.coefficients[0])))
    assert curve(300.0) == pytest.approx(
        float(np.exp(chebyshev.chebval((600.0 - 900.0) / 400.0, curve.coefficients[0]))), rel=1e-15
    )


def test_evaporation_rate_is_unchanged_by_the_fast_curve_paths(monkeypatch):
    from masstransfer import humidity
    from masstransfer.substances import _properties

    T = np.linspace(300.0, 420.0, 4001)
    kwargs = {"T": T, "h": 30.0, "y": 0.02}
    fast = humidity.evaporation_rate("water", "air", **kwargs)
    # the plain forms: numpy's chebval, and every piecewise curve through the per-point gather
    monkeypatch.setattr(_properties, "_chebval", lambda x, c: chebyshev.chebval(x, c))
    monkeypatch.setattr(_properties, "_PIECE_LOOP_MAX", -1)
    plain = humidity.evaporation_rate("water", "air", **kwargs)
    for field in ("T_surface", "mass_flux", "k_c", "q_latent"):
        np.testing.assert_allclose(getattr(fast, field), getattr(plain, field), rtol=1e-12, err_msg=field)
