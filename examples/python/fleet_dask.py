"""Health normalisation of a fleet's case drain readings on Dask, partition by partition.

Invented scenario: a fleet of compensated piston pumps on presses, each logging its case drain
flow, outlet pressure and oil temperature. Every reading is brought to one reference state
(200 bar, 50 degC) so that readings of one machine compare over time and machines compare with
each other. One process does it with `normalise(df)`; `normalise_on_dask(df)` does the same per
partition on a Dask cluster (the numbers are identical: each row is computed alone).

    /usr/bin/python3 examples/python/fleet_dask.py        # 200 machines, a local cluster

Results are engineering estimates; a normalised drain flow is not a clearance to run. Never
block, cap or valve a case drain; the pump maker's limits take precedence.
"""
import numpy as np
import pandas as pd

import pumploss

REF_DP_PA, REF_T_K = 200e5, 323.15
OIL = dict(t1_k=313.15, nu1_m2_s=46e-6, t2_k=373.15, nu2_m2_s=6.8e-6)  # an ISO VG 46 oil
ALPHA_PER_K = 6.5e-4  # volumetric expansion of a mineral oil, 1/K (typical)


def make_fleet(machines=200, readings_per_machine=500, seed=1):
    """Readings from the laminar law q ~ dp / mu around each machine's true reference drain,
    with 1 % meter noise (invented data)."""
    rng = np.random.default_rng(seed)
    m = np.repeat(np.arange(machines), readings_per_machine)
    q_ref = rng.uniform(2.0, 6.0, machines)[m] / 60000
    dp = rng.uniform(80e5, 280e5, m.size)
    t = rng.uniform(283.15, 343.15, m.size)
    nu = pumploss.viscosity_d341(OIL["t1_k"], OIL["nu1_m2_s"], OIL["t2_k"], OIL["nu2_m2_s"], t).nu_m2_s
    nu_ref = pumploss.viscosity_d341(OIL["t1_k"], OIL["nu1_m2_s"], OIL["t2_k"], OIL["nu2_m2_s"], REF_T_K)
    rho = 1.0 / (1.0 + ALPHA_PER_K * (t - REF_T_K))  # density ratio to the reference
    rho_ref = 1.0
    q = q_ref * (dp / REF_DP_PA) * (nu_ref * rho_ref) / (nu * rho) * (1 + 0.01 * rng.standard_normal(m.size))
    return pd.DataFrame({"machine": m, "outlet_pa": dp, "oil_k": t, "drain_m3_s": q, "true_ref_m3_s": q_ref})


def normalise(df):
    """Each reading's drain flow at the reference state (pumploss.leakage_normalise)."""
    r = pumploss.leakage_normalise(df["drain_m3_s"].to_numpy(), df["outlet_pa"].to_numpy(),
                                   df["oil_k"].to_numpy(), REF_DP_PA, REF_T_K, OIL["t1_k"],
                                   OIL["nu1_m2_s"], OIL["t2_k"], OIL["nu2_m2_s"], ALPHA_PER_K, 1.0, 1.0)
    out = df[["machine"]].copy()
    out["drain_ref_m3_s"] = r.q_ref_m3_s
    out["status"] = r.status
    return out


def normalise_on_dask(df, partitions=16):
    """The same, one task per partition (a lazy Dask DataFrame: .compute() it)."""
    import dask.dataframe as dd
    meta = pd.DataFrame({"machine": pd.Series(dtype=df["machine"].dtype),
                         "drain_ref_m3_s": pd.Series(dtype="float64"), "status": pd.Series(dtype="int32")})
    return dd.from_pandas(df, npartitions=partitions).map_partitions(normalise, meta=meta)


if __name__ == "__main__":
    from distributed import Client, LocalCluster
    fleet = make_fleet()
    with LocalCluster(n_workers=2, threads_per_worker=1, dashboard_address=None) as cluster, Client(cluster):
        result = normalise_on_dask(fleet).compute()
    per_machine = result.groupby("machine")["drain_ref_m3_s"].median() * 60000
    print(f"{len(result)} readings of {per_machine.size} machines normalised to 200 bar, 50 degC")
    print(per_machine.describe().to_string(float_format=lambda v: f"{v:.3f} L/min"))
    print("Engineering estimates; the pump maker's limits and local codes take precedence.")
