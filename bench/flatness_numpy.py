"""Reference timing of the flatness map in numpy, the way a scientist would vectorise it.

Reads the inputs written by bench/flatness-map.ts (JSON), builds the (receivers x modes) mode-shape
matrix and the (modes x frequencies) complex matrix of 1/(Lambda_n (omega^2 - omega_n^2 - 2j delta omega_n)),
multiplies them in one complex matrix product, and takes the population standard deviation of
20 log10 |H| over frequency for every receiver (the modal sum of ../shared/CONTRACTS.md, lib/modes).

Usage: python3 bench/flatness_numpy.py INPUT.json OUTPUT.bin  -> prints a JSON line with timings;
OUTPUT.bin receives the std-dev map as little-endian float64, index ix * gridY + iy.
"""
import json
import sys
import time

import numpy as np


def modes(L, W, H, fmax, c):
    """All (nx, ny, nz) with f <= fmax, (0,0,0) included (Rayleigh's equation)."""
    nx, ny, nz = np.meshgrid(
        np.arange(int(2 * L * fmax / c) + 2),
        np.arange(int(2 * W * fmax / c) + 2),
        np.arange(int(2 * H * fmax / c) + 2),
        indexing="ij",
    )
    f = c / 2 * np.sqrt((nx / L) ** 2 + (ny / W) ** 2 + (nz / H) ** 2)
    keep = f <= fmax
    return nx[keep].astype(float), ny[keep].astype(float), nz[keep].astype(float), f[keep]


def flatness_map(p):
    L, W, H = p["room"]["lengthM"], p["room"]["widthM"], p["room"]["heightM"]
    c, T = p["speedOfSound"], p["rt60Seconds"]
    nx, ny, nz, fn = modes(L, W, H, p["maxModeFrequencyHz"], c)
    gx, gy, z = p["gridX"], p["gridY"], p["heightM"]
    x = (np.arange(gx) + 0.5) * L / gx
    y = (np.arange(gy) + 0.5) * W / gy
    X, Y = np.meshgrid(x, y, indexing="ij")  # receiver r = ix * gy + iy
    X, Y = X.ravel(), Y.ravel()
    sx, sy, sz = p["source"]
    psi_r = (np.cos(np.pi * np.outer(X, nx) / L) * np.cos(np.pi * np.outer(Y, ny) / W)
             * np.cos(np.pi * z * nz / H))                                   # (receivers, modes)
    psi_s = np.cos(np.pi * sx * nx / L) * np.cos(np.pi * sy * ny / W) * np.cos(np.pi * sz * nz / H)
    lam = np.where(nx > 0, 0.5, 1.0) * np.where(ny > 0, 0.5, 1.0) * np.where(nz > 0, 0.5, 1.0)
    w = 2 * np.pi * np.asarray(p["frequenciesHz"])
    wn = 2 * np.pi * fn
    delta = 3 * np.log(10) / T
    D = lam[:, None] * (w[None, :] ** 2 - wn[:, None] ** 2 - 2j * delta * wn[:, None])  # (modes, freqs)
    H_ = w[None, :] * (psi_r @ (psi_s[:, None] / D))                        # (receivers, freqs)
    level = 20 * np.log10(np.abs(H_))
    return level.std(axis=1), len(fn)


def blas_info():
    try:
        from threadpoolctl import threadpool_info  # optional, not installed by this project
        return [{k: i.get(k) for k in ("internal_api", "version", "architecture", "num_threads")} for i in threadpool_info()]
    except ImportError:
        cfg = np.show_config(mode="dicts")
        blas = cfg.get("Build Dependencies", {}).get("blas", {})
        return {"threadpoolctl": "not installed", "blas": blas.get("name"), "version": blas.get("version"),
                "openblas configuration": blas.get("openblas configuration")}


def main():
    p = json.load(open(sys.argv[1]))
    runs = int(p.get("numpyRuns", 5))
    out, count = flatness_map(p)  # warm-up
    times = []
    for _ in range(runs):
        t = time.perf_counter()
        out, count = flatness_map(p)
        times.append((time.perf_counter() - t) * 1000)
    out.astype("<f8").tofile(sys.argv[2])
    print(json.dumps({"timesMs": times, "modes": int(count), "numpy": np.__version__, "blas": blas_info()}))


if __name__ == "__main__":
    main()
