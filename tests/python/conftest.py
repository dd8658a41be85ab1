"""Fixtures for the ctypes tests: the library named by PUMPLOSS_LIBRARY (set by ctest)."""
import os

import pytest

import pumploss


@pytest.fixture(scope="session")
def lib():
    path = os.environ.get("PUMPLOSS_LIBRARY")
    if not path:
        pytest.fail("PUMPLOSS_LIBRARY is not set; run these tests through ctest")
    return pumploss.load(path)
