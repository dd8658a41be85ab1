"""The pumploss Python package: scalars, numpy broadcasting, statuses, handles, docstrings.
Check values name their source beside them."""
import warnings

import numpy as np
import pytest

import pumploss


def test_imports_without_a_header_and_knows_every_function():
    assert pumploss.version().count(".") == 2
    for name in pumploss.FUNCTIONS:
        short = name[len("pumploss_"):]
        ret, params, _ = pumploss.FUNCTIONS[name]
        if ret == "void" or any(p[0] in ("HIN", "HOUT") for p in params):
            continue
        assert callable(getattr(pumploss, short)), short


def test_scalar_values_against_published_figures():
    # NIST SP 811 (2008), B.8: 1 psi = 6.894 757 293 168 kPa (exact by definition of lbf, in)
    assert pumploss.convert(1.0, "psi", "Pa") == pytest.approx(6894.757293168361, rel=1e-15)
    # ISO 3448:1992 Table 1: VG 46 mid-point 46 mm^2/s, limits 41.4 and 50.6 mm^2/s
    vg = pumploss.iso_vg(46)
    assert (vg.mid_m2_s, vg.min_m2_s, vg.max_m2_s) == pytest.approx((46e-6, 41.4e-6, 50.6e-6), rel=1e-12)
    # ASTM D341-09 worked example (A = 9.5259, B = 3.7449 gives 8.53 cSt at 80 degC):
    # the line through two points of it returns the same constants
    t1, t2 = 313.15, 373.15
    nu = lambda t: (10 ** (10 ** (9.5259 - 3.7449 * np.log10(t))) - 0.7) * 1e-6
    c = pumploss.d341_coefficients(t1, nu(t1), t2, nu(t2))
    assert (c.a, c.b) == pytest.approx((9.5259, 3.7449), rel=1e-9)
    # definitions (self-calculated): eta_v = q / (V n)
    r = pumploss.pump_efficiency(71e-6, 25.0, 2e7, 1.7e-3, 240.0)
    assert r.eta_v == pytest.approx(1.7e-3 / (71e-6 * 25.0), rel=1e-15)


def test_arrays_broadcast_and_equal_scalar_calls_bit_for_bit():
    dp = np.linspace(5e6, 3e7, 4)
    speed = np.array([[25.0], [30.0], [35.0]])
    r = pumploss.pump_efficiency(71e-6, speed, dp, 1.7e-3, 240.0)
    assert r.eta_t.shape == (3, 4) and r.status.shape == (3, 4)
    for i in range(3):
        for j in range(4):
            s = pumploss.pump_efficiency(71e-6, float(speed[i, 0]), float(dp[j]), 1.7e-3, 240.0)
            assert (r.eta_v[i, j], r.eta_hm[i, j], r.eta_t[i, j]) == (s.eta_v, s.eta_hm, s.eta_t)
    # lists are arrays too; a function without a batch variant loops in C per element
    nu = pumploss.viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, [273.15, 313.15, 373.15])
    assert nu.nu_m2_s[1] == pytest.approx(46e-6, rel=1e-12) and list(nu.status) == [0, 0, 0]


def test_incompatible_shapes_raise_value_error():
    with pytest.raises(ValueError):
        pumploss.pump_efficiency(71e-6, [20.0, 25.0, 30.0], [1e7, 2e7], 1.7e-3, 240.0)
    with pytest.raises(ValueError):
        pumploss.displacement_slope([20.0, 25.0, 30.0], [1e-3, 2e-3])
    with pytest.raises(TypeError):
        pumploss.pump_efficiency(71e-6, 25.0)


def test_two_counts_in_a_row_are_given_and_checked():
    # A levels x per_level grid (ISO 8426-1 two-step): both counts are explicit. Invented pump
    # (self-calculated truth): q = V n - k dp with V = 71 cm3/rev, so the two-step method returns V.
    v, k = 71e-6, 2e-12
    speed = np.tile([10.0, 15.0, 20.0, 25.0, 30.0], 5)
    dp = np.repeat([50e5, 100e5, 150e5, 200e5, 250e5], 5)
    flow = v * speed - k * dp
    r = pumploss.displacement_two_step(5, 5, speed, dp, flow)
    assert abs(r.v_m3_rev / v - 1) < 1e-9
    with pytest.raises(ValueError):  # 24 elements for a 5 x 5 grid
        pumploss.displacement_two_step(5, 5, speed[:24], dp[:24], flow[:24])


def test_statuses_exceptions_for_scalars_status_arrays_for_arrays():
    with pytest.raises(pumploss.PumplossError) as e:
        pumploss.pump_efficiency(71e-6, 25.0, -2e7, 1.7e-3, 240.0)
    assert e.value.status == pumploss.PUMPLOSS_EDOMAIN
    r = pumploss.pump_efficiency(71e-6, 25.0, [2e7, -2e7, np.nan], 1.7e-3, 240.0)
    assert list(r.status) == [0, pumploss.PUMPLOSS_EDOMAIN, pumploss.PUMPLOSS_ENONFINITE]
    assert np.isfinite(r.eta_t[0]) and np.isnan(r.eta_t[1:]).all()
    with pytest.warns(pumploss.PumplossWarning):  # eta_v above 1: valid but implausible
        pumploss.pump_efficiency(71e-6, 25.0, 2e7, 2.5e-3, 240.0)
    with pytest.raises(pumploss.PumplossError):
        pumploss.convert([1.0, 2.0], "bar", "furlong")


def test_handles_are_classes_with_context_managers():
    with pumploss.Line() as line:
        line.add_pipe(0.0127, 5.0, 1.5e-6)
        dp = line.pressure_drop(10 / 60000, 870.0, 0.04)
        assert dp == pumploss.pipe_pressure_drop(10 / 60000, 870.0, 0.04, 0.0127, 5.0, 1.5e-6)
    assert line.closed
    with pytest.raises(ValueError):
        line.pressure_drop(1e-4, 870.0, 0.04)
    line.close()  # twice: a no-op


def test_docstrings_carry_units():
    assert "m^2/s" in pumploss.viscosity_d341.__doc__
    assert "K" in pumploss.viscosity_d341.__doc__


def test_pandas_helper_reads_units_people_write(tmp_path):
    import pumploss.pandas as plpd
    f = tmp_path / "r.csv"
    f.write_text("when,drain [l/min],outlet (bar),oil [°C],speed [RPM],flow [gpm]\n"
                 "2026-01-05,3.2,200,50,1500,10\n", encoding="utf-8")
    df = plpd.read_readings(f)
    assert list(df.columns) == ["when", "drain_m3_s", "outlet_pa", "oil_k", "speed_rev_s", "flow_m3_s"]
    row = df.iloc[0]
    assert row.drain_m3_s == pytest.approx(3.2 / 60000, rel=1e-15)
    assert row.outlet_pa == pytest.approx(2e7, rel=1e-15)
    assert row.oil_k == pytest.approx(323.15, rel=1e-15)
    assert row.speed_rev_s == pytest.approx(25.0, rel=1e-15)
    # NIST SP 811 B.8: 1 US gallon = 3.785 411 784 L (exact)
    assert row.flow_m3_s == pytest.approx(10 * 3.785411784e-3 / 60, rel=1e-14)
    with pytest.raises(ValueError, match="drain"):
        plpd.to_si(__import__("pandas").DataFrame({"drain [furlongs/fortnight]": [1.0]}))


def test_an_installed_package_carries_its_library():
    import os
    if os.environ.get("PUMPLOSS_LIBRARY"):
        pytest.skip("the build tree's library was given")
    here = os.path.dirname(pumploss.__file__)
    assert os.path.commonpath([pumploss.library().path, here]) == here
    assert os.path.exists(os.path.join(here, "__init__.pyi"))
