"""Scale-out: the health normalisation of many machines' readings on a Dask local cluster,
partition by partition, gives the same numbers as one process (examples/python/fleet_dask.py)."""
import importlib.util
import os

import numpy as np
import pytest

dask = pytest.importorskip("dask")
distributed = pytest.importorskip("distributed")

HERE = os.path.dirname(os.path.abspath(__file__))
spec = importlib.util.spec_from_file_location(
    "fleet_dask", os.path.join(HERE, "..", "..", "examples", "python", "fleet_dask.py"))
fleet = importlib.util.module_from_spec(spec)
spec.loader.exec_module(fleet)


def test_dask_partitions_equal_one_process():
    df = fleet.make_fleet(machines=40, readings_per_machine=50, seed=3)
    one = fleet.normalise(df)
    with distributed.LocalCluster(n_workers=2, threads_per_worker=1, processes=True,
                                  dashboard_address=None) as cluster, distributed.Client(cluster):
        many = fleet.normalise_on_dask(df, partitions=8).compute()
    many = many.sort_index()
    assert len(many) == len(one) == 2000
    assert np.array_equal(many["drain_ref_m3_s"].to_numpy(), one["drain_ref_m3_s"].to_numpy())
    # the truth the readings were made from: every machine's reference drain is recovered
    per_machine = one.groupby("machine")["drain_ref_m3_s"].median()
    truth = df.groupby("machine")["true_ref_m3_s"].first()
    assert np.allclose(per_machine, truth, rtol=0.03)
