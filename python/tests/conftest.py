import warnings

import pytest


@pytest.fixture(autouse=True)
def _reports_are_seen():
    with warnings.catch_warnings():
        warnings.simplefilter("always")
        yield
