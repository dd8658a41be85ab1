"""Orifice and capillary functions through ctypes against python3-fluids (reference library):
fluids.flow_meter.flow_meter_discharge for an orifice with beta -> 0, and the laminar friction
factor 64/Re (fluids.friction.friction_laminar) for the capillary without entrance loss."""
import math

import pytest
from fluids.flow_meter import flow_meter_discharge
from fluids.friction import friction_laminar


@pytest.mark.parametrize("dp, d, cd", [(100e5, 1e-3, 0.61), (2e5, 0.5e-3, 0.7), (350e5, 2e-3, 0.62)])
def test_orifice_matches_fluids_discharge(lib, dp, d, cd):
    rho = 870.0
    # fluids: m = C/sqrt(1 - beta^4) eps pi/4 Do^2 sqrt(2 rho dP); D = 1 m makes beta^4 negligible
    m = flow_meter_discharge(D=1.0, Do=d, P1=dp + 1e5, P2=1e5, rho=rho, C=cd, expansibility=1.0)
    q = lib.orifice_flow(dp, rho, d, cd)
    beta4 = (d / 1.0) ** 4
    assert q * rho == pytest.approx(m * math.sqrt(1 - beta4), rel=1e-14)
    assert lib.orifice_dp(q, rho, d, cd) == pytest.approx(dp, rel=1e-14)
    assert lib.orifice_diameter(q, dp, rho, cd) == pytest.approx(d, rel=1e-14)


def test_methods_row17(lib):
    assert lib.orifice_flow(100e5, 870.0, 1e-3, 0.61) * 60000 == pytest.approx(4.3584, rel=2e-5)


@pytest.mark.parametrize("q", [1e-7, 1e-6, 5e-6])
def test_capillary_matches_darcy_laminar(lib, q):
    rho, mu, d, length = 870.0, 0.04, 1e-3, 0.05
    v = 4 * q / (math.pi * d * d)
    re = rho * v * d / mu
    dp_ref = friction_laminar(re) * length / d * rho * v * v / 2
    assert lib.capillary_dp(q, rho, mu, d, length, 0.0) == pytest.approx(dp_ref, rel=1e-13)
    assert lib.capillary_flow(dp_ref, rho, mu, d, length, 0.0) == pytest.approx(q, rel=1e-13)


def test_low_reynolds_orifice_reports_regime(lib):
    import pumploss
    with pytest.warns(pumploss.PumplossWarning):
        lib.orifice_reynolds(1e-8, 1e-3, 870.0, 0.04)
    st, q = lib.raw("pumploss_orifice_flow_viscous", 1.0, 870.0, 1.0, 0.5e-3, 0.611, 1 / math.sqrt(12 * math.pi))
    assert st == 0
    assert q == pytest.approx((0.5e-3) ** 3 / 24.0, rel=1e-3)  # Sampson creeping flow
