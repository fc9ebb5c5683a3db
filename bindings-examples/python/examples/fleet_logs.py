#!/usr/bin/env python3
"""Scaling out: a partitioned log of gas-meter readings processed with Dask.

The scenario is invented: the fictional Brackenfield Biogas Cooperative runs 48 flow meters
on three gas qualities (raw biogas, upgraded biomethane, and a propane-enriched grid blend).
Each meter logs absolute pressure, temperature, relative humidity and the actual (wet) volume
flow every few seconds. The example

1. writes such a log as CSV partitions (``--rows``, default 10^7, all invented, with about one
   reading in a thousand faulty: a missing pressure, a sensor stuck at -273 degC, a humidity
   above 100 %);
2. processes it with Dask on a LocalCluster of worker processes, per row:
   - wet-gas correction: the dry-gas partial pressure p_dry = p - RH p_ws(T) (IAPWS-IF97);
   - the real-gas density of the dry gas at p_dry (Peng-Robinson, or ``--model best`` for the
     reference-grade model; the meter's gas quality);
   - the dry-gas flow at the reference condition 15 degC, 101.325 kPa (ISO 13443) and the
     dry-gas mass flow;
   and per meter a summary: readings, faulty readings, mean pressure, dry-gas volume and mass
   delivered over the log;
3. prints rows per second with 1 worker and with N workers (``--workers``, default the number
   of cores).

Every computation is one gaskit batch call per gas quality and partition (gaskit.arrays), so
the work per row is done in C; a faulty reading becomes NaN with its status and is counted,
never stops the pipeline.

On a cluster of several machines the only change is the scheduler address: start
``dask scheduler`` on one machine and ``dask worker tcp://SCHEDULER:8786`` on each of the
others (each with gaskit and libgaskit installed, and the log on storage they all read), then
run this script with ``--scheduler tcp://SCHEDULER:8786``.

Results are engineering estimates (see the package README's safety notes); biogas holds
methane (flammable) and may hold hydrogen sulfide (toxic): the figures are no substitute for
custody-transfer metering standards or site gas-detection equipment.

Usage: python3 fleet_logs.py [--rows N] [--partitions P] [--workers N] [--dir DIR]
                             [--scheduler ADDRESS] [--keep] [--model pr|best|...]
"""
import argparse
import glob
import os
import shutil
import sys
import tempfile
import time

sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), ".."))

import numpy as np  # noqa: E402
import pandas as pd  # noqa: E402

import gaskit  # noqa: E402

# The fictional cooperative's gas qualities (invented compositions) and meters per quality.
QUALITIES = {
    "raw": "CH4=0.58, CO2=0.39, N2=0.02, O2=balance",
    "upgraded": "CH4=0.965, CO2=0.02, N2=0.01, O2=balance",
    "enriched": "CH4=0.90, C3H8=0.06, CO2=0.02, N2=balance",
}
METERS = ["BBC-%s-%02d" % (q[:3].upper(), i) for q in QUALITIES for i in range(1, 17)]
METER_QUALITY = {m: q for q in QUALITIES for m in METERS if m[4:7] == q[:3].upper()}
REFERENCE = "15C_101325Pa"  # ISO 13443
SAMPLE_S = 5.0              # seconds between readings of one meter


def write_partition(path, rows, seed):
    """One CSV partition of invented readings (about 0.1 % faulty)."""
    rng = np.random.default_rng(seed)
    meter = rng.integers(0, len(METERS), rows)
    p_bar = rng.uniform(1.2, 12.0, rows)
    t_c = rng.normal(22.0, 8.0, rows)
    rh = rng.uniform(0.3, 1.0, rows)
    q_m3h = rng.uniform(20.0, 400.0, rows)
    fault = rng.random(rows)
    p_bar[fault < 0.0004] = np.nan            # a missing pressure
    t_c[(fault >= 0.0004) & (fault < 0.0007)] = -273.15  # a sensor stuck at absolute zero
    rh[(fault >= 0.0007) & (fault < 0.001)] = 1.3        # a humidity above 100 %
    df = pd.DataFrame({
        "time_s": np.arange(rows, dtype=np.int64) + seed * rows,
        "meter": np.asarray(METERS, dtype=object)[meter],
        "p_bar": np.round(p_bar, 4), "t_degC": np.round(t_c, 3), "rh": np.round(rh, 3),
        "flow_m3h": np.round(q_m3h, 3),
    })
    df.to_csv(path, index=False)
    return rows


MODEL = "pr"  # set from --model in main(); worker processes get it with the task


def process_partition(df, model=None):
    """Per row: wet-gas correction, real-gas density, reference-condition flow, mass flow."""
    model = model or MODEL
    out = df.copy()
    p = df["p_bar"].to_numpy(np.float64) * 1e5
    t = df["t_degC"].to_numpy(np.float64) + 273.15
    dry = gaskit.arrays.dry_gas_pressure(p, t, df["rh"].to_numpy(np.float64))
    rho = np.full(len(df), np.nan)
    q_ref = np.full(len(df), np.nan)
    w = np.full(len(df), np.nan)
    status = dry.status.astype(np.int32).copy()
    quality = df["meter"].map(METER_QUALITY).to_numpy()
    q = df["flow_m3h"].to_numpy(np.float64) / 3600.0
    for name, text in QUALITIES.items():
        rows = np.flatnonzero(quality == name)
        if rows.size == 0:
            continue
        pd_rows, t_rows = dry.value[rows], t[rows]
        d = gaskit.arrays.density(text, pd_rows, t_rows, model=model)
        r = gaskit.arrays.flow_to_reference(text, q[rows], pd_rows, t_rows, reference=REFERENCE,
                                            model=model)
        rho[rows] = d.value
        q_ref[rows] = r.value
        w[rows] = q[rows] * d.value
        # the first failure of a row is its status (a bad pressure fails every step)
        status[rows] = np.where(status[rows] != 0, status[rows],
                                np.where(d.status != 0, d.status, r.status))
    out["p_dry_Pa"] = dry.value
    out["rho_dry"] = rho
    out["q_ref_m3s"] = q_ref
    out["w_kgs"] = w
    out["status"] = status
    return out


def summarise(frame):
    """Per meter: readings, faulty readings, mean pressure, dry gas delivered."""
    g = frame.assign(bad=(frame["status"] != 0).astype(np.int64),
                     v_ref=frame["q_ref_m3s"].fillna(0.0) * SAMPLE_S,
                     mass=frame["w_kgs"].fillna(0.0) * SAMPLE_S)
    return g.groupby("meter").agg(readings=("status", "size"), faulty=("bad", "sum"),
                                  p_mean_bar=("p_bar", "mean"), dry_m3_ref=("v_ref", "sum"),
                                  dry_kg=("mass", "sum"))


def run(client, pattern, model):
    import dask.dataframe as dd
    frame = dd.read_csv(pattern, dtype={"meter": "object"}, blocksize=None)
    meta = process_partition(frame._meta, model)
    processed = frame.map_partitions(process_partition, model, meta=meta)
    t0 = time.perf_counter()
    summary = client.compute(summarise(processed)).result()
    return summary, time.perf_counter() - t0


def main():
    ap = argparse.ArgumentParser(description="gas-meter log processed with Dask and gaskit")
    ap.add_argument("--rows", type=int, default=10_000_000)
    ap.add_argument("--partitions", type=int, default=32)
    ap.add_argument("--workers", type=int, default=os.cpu_count() or 2)
    ap.add_argument("--dir", help="where the CSV partitions go (default: a temporary folder)")
    ap.add_argument("--scheduler", help="address of a running Dask scheduler (a cluster)")
    ap.add_argument("--keep", action="store_true", help="keep the written log")
    ap.add_argument("--model", default="pr",
                    help='equation of state: "pr" (default), "best" (reference-grade), ...')
    args = ap.parse_args()

    from dask.distributed import Client, LocalCluster

    workdir = args.dir or tempfile.mkdtemp(prefix="fleet_logs_")
    os.makedirs(workdir, exist_ok=True)
    pattern = os.path.join(workdir, "part-*.csv")
    info = gaskit.build_info()
    print("gaskit %s (%s), model %s; log: %d rows in %d partitions under %s"
          % (info.version, info.dtype, gaskit.model(args.model).name, args.rows,
             args.partitions, workdir))
    try:
        per = [args.rows // args.partitions + (i < args.rows % args.partitions)
               for i in range(args.partitions)]
        t0 = time.perf_counter()
        if args.scheduler:
            configs = [("cluster at %s" % args.scheduler, dict(address=args.scheduler))]
        else:
            configs = [("1 worker", dict(n_workers=1)),
                       ("%d workers" % args.workers, dict(n_workers=args.workers))]
        for label, conf in configs:
            if "address" in conf:
                client, cluster = Client(conf["address"]), None
            else:
                cluster = LocalCluster(n_workers=conf["n_workers"], threads_per_worker=1,
                                       processes=True, dashboard_address=None)
                client = Client(cluster)
            try:
                if not glob.glob(pattern):
                    futures = [client.submit(write_partition,
                                             os.path.join(workdir, "part-%04d.csv" % i), n, i,
                                             pure=False) for i, n in enumerate(per)]
                    written = sum(client.gather(futures))
                    print("wrote %d rows in %.1f s" % (written, time.perf_counter() - t0))
                summary, secs = run(client, pattern, args.model)
            finally:
                client.close()
                if cluster is not None:
                    cluster.close()
            total = int(summary["readings"].sum())
            print("%-12s %10d rows in %6.2f s: %10.0f rows/s (%d faulty rows)"
                  % (label, total, secs, total / secs, int(summary["faulty"].sum())))
        with pd.option_context("display.width", 120, "display.precision", 4):
            print(summary.sort_index().head(6).to_string())
            print("... %d meters; dry gas delivered at 15 degC, 101.325 kPa: %.4g m3, %.4g kg"
                  % (len(summary), summary["dry_m3_ref"].sum(), summary["dry_kg"].sum()))
        if total != args.rows:
            raise SystemExit("rows processed %d != rows written %d" % (total, args.rows))
    finally:
        if not args.keep and not args.dir:
            shutil.rmtree(workdir, ignore_errors=True)


if __name__ == "__main__":
    main()
