"""Readings with unit-suffixed columns into SI, for pandas users.

    import pumploss.pandas as plpd
    df = plpd.read_readings("readings.csv")     # or plpd.to_si(existing_dataframe)

A column named ``name [unit]`` or ``name (unit)`` (``drain [L/min]``, ``oil (°C)``,
``speed [RPM]``) becomes ``name_<si suffix>`` in SI (``drain_m3_s``, ``oil_k``,
``speed_rev_s``), converted with the library's exact factors; other columns pass unchanged.
Unit spellings people export (``l/min``, ``lpm``, ``°C``, ``°F``, ``RPM``, ``gpm``) are
accepted; an unknown unit raises ValueError naming the column. Conversions are affine, so a
whole column converts in one numpy operation.
"""
import re

import numpy as np
import pandas as pd

from . import PumplossError, unit_convert

# SI units, their parameter-name suffix in pumploss.h, tried in this order
_SI = [("Pa", "pa"), ("m3/s", "m3_s"), ("K", "k"), ("rev/s", "rev_s"), ("N.m", "n_m"),
       ("m3/rev", "m3_rev"), ("m2/s", "m2_s"), ("Pa.s", "pa_s"), ("m", "m"), ("kg/m3", "kg_m3"),
       ("W", "w"), ("m/s", "m_s"), ("kg/s", "kg_s"), ("N", "n"), ("m3", "m3"), ("J/(kg.K)", "j_kg_k")]
_ALIASES = {"°c": "degC", "ºc": "degC", "deg c": "degC", "c": "degC", "°f": "degF", "ºf": "degF",
            "f": "degF", "l/min": "L/min", "lpm": "L/min", "l/s": "L/s", "rpm": "rpm", "1/min": "rpm",
            "min-1": "rpm", "gpm": "gpm", "bar": "bar", "psi": "psi", "nm": "N.m", "n.m": "N.m",
            "n m": "N.m", "cc/rev": "cm3/rev", "cm³/rev": "cm3/rev", "mm²/s": "mm2/s", "cst": "cSt"}
_COLUMN = re.compile(r"^\s*(.*?)\s*[\[(]\s*([^\])]+?)\s*[\])]\s*$")


def unit_symbol(unit):
    """The library's symbol for a unit as people write it (ValueError when unknown)."""
    u = unit.strip()
    return _ALIASES.get(u.lower(), u)


def affine_to_si(unit):
    """(factor, offset, si_suffix) with value_si = factor * value + offset."""
    sym = unit_symbol(unit)
    for si, suffix in _SI:
        try:
            b = unit_convert(0.0, sym, si)
            a = unit_convert(1.0, sym, si) - b
            return a, b, suffix
        except PumplossError as e:
            if e.status == 6:  # PUMPLOSS_EUNIT: not a symbol at all
                raise ValueError(f"unknown unit '{unit}'") from None
            continue  # another quantity: try the next SI unit
    raise ValueError(f"unit '{unit}' has no SI counterpart here")


def _snake(name):
    return re.sub(r"[^0-9a-zA-Z]+", "_", name).strip("_").lower()


def to_si(df):
    """A copy of the DataFrame with every unit-suffixed column in SI (see the module text)."""
    out = {}
    for col in df.columns:
        m = _COLUMN.match(str(col))
        if not m:
            out[col] = df[col]
            continue
        try:
            a, b, suffix = affine_to_si(m.group(2))
        except ValueError as e:
            raise ValueError(f"column '{col}': {e}") from None
        values = pd.to_numeric(df[col], errors="coerce").to_numpy(dtype=np.float64)
        out[f"{_snake(m.group(1))}_{suffix}"] = a * values + b
    return pd.DataFrame(out, index=df.index)


def read_readings(path, **read_csv_args):
    """Read a CSV of readings (pandas.read_csv arguments pass through) and convert it to SI."""
    return to_si(pd.read_csv(path, **read_csv_args))
