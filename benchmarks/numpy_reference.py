#!/usr/bin/env python3
"""A plain NumPy/SciPy vortex-lattice solve of a wing file: the reference that `spanlift solve` is timed against.

    python3 benchmarks/numpy_reference.py WING.wing.yaml [--compare spanlift.jar]

What a competent user would write with NumPy and SciPy: the horseshoe-vortex lattice method as the textbooks
give it (Katz and Plotkin, Low-Speed Aerodynamics, 2nd ed., 2001, ch. 12; Bertin, Aerodynamics for Engineers;
both cited from memory), the influence matrix assembled with broadcasting (control points by panels), one LU
factorization (scipy.linalg.lu_factor) and one lu_solve for all angles of attack. The whole span is one system
of 2 x strips x rows unknowns, with no use of the mirror symmetry, which is what a plain script does (Spanlift
solves half-span systems of half the unknowns: each a quarter of the matrix and an eighth of the LU work).

It builds the lattice by Spanlift's own rules (DEVELOPERS.md, "Lattice" in the design notes), so that both
solve the same problem: strip edges from the cosine law on the half span, y = s sin(pi u / 2), with the nearest
edges moved onto the control ends and the stations and the law's edges between two fixed edges mapped
linearly; rows from the full cosine law, (1 - cos(pi u)) / 2, with on each flapped or aileron strip the row
edge nearest the hinge moved so that the first deflected row's bound leg lies on the hinge line; bound leg on
the panel quarter-chord line; trailing legs from its ends to +infinity along +x; control point at three-quarter
chord and at the strip's midpoint in the spacing angle. The lattice lies on the flat, untwisted surface with
its dihedral; twist and the NACA four-digit camber slope (blended between stations as the sections are) enter
the right-hand side as the incidence eps: rhs = -V.n - eps V.t with t = +x. Lift by Kutta-Joukowski on the
bound legs with the freestream: CL = 2 sum(Gamma_j / V * l_y,j) / S, S the projected area of both halves.
Controls are at zero deflection: they only place cut lines and hinge rows. Differences from Spanlift, none of
which acts on a wing alone of this kind: no cut-off near a vortex line (no control point lies on one), no
trailing-leg cores (a wing alone never feels them), and only what the demo trainer uses is read (one mirrored
surface given by stations, 4-digit NACA mean lines, lattice strips and rows, cosine spacing both ways).

Prints CL per angle of attack, the time of each phase and the total; --compare JAR runs `java -jar JAR solve
WING --format json` afterwards (outside the timed part) and prints the largest differences.
"""
import time

T_START = time.perf_counter()  # before the imports, so that they are timed too

import argparse  # noqa: E402
import json  # noqa: E402
import re  # noqa: E402
import subprocess  # noqa: E402
import sys  # noqa: E402

import numpy as np  # noqa: E402
import scipy.linalg  # noqa: E402
import yaml  # noqa: E402

ALPHAS_DEG = np.arange(-4.0, 12.0 + 1e-9, 2.0)  # spanlift solve's default, -4:12:2


def naca4_slope(designation, x):
    """dz/dx of the NACA four-digit mean line at chord fraction x."""
    match = re.fullmatch(r"NACA\s*(\d)(\d)(\d\d)", designation.strip())
    if not match:
        sys.exit(f"only 4-digit NACA mean lines are read, not {designation!r}")
    m, p = int(match[1]) / 100, int(match[2]) / 10
    if m == 0:
        return np.zeros_like(x)
    return np.where(x < p, 2 * m / p**2, 2 * m / (1 - p) ** 2) * (p - x)


def strip_edges(y0, y1, n, cuts):
    """Cosine strip edges and control-point y on a half span, the nearest edges moved onto the cuts."""
    law = y0 + (y1 - y0) * np.sin(0.5 * np.pi * np.arange(n + 1) / n)
    mid = y0 + (y1 - y0) * np.sin(0.5 * np.pi * (np.arange(n) + 0.5) / n)
    tol = 1e-9 * (y1 - y0)
    interior = []
    for c in sorted(cuts):
        if y0 + tol < c < y1 - tol and (not interior or c - interior[-1] > tol):
            interior.append(c)
    fixed_k, fixed_y = [0], [y0]
    for j, c in enumerate(interior):
        nearest = 1 + int(np.argmin(np.abs(law[1:n] - c)))
        fixed_k.append(max(fixed_k[-1] + 1, min(n - (len(interior) - j), nearest)))
        fixed_y.append(c)
    fixed_k.append(n)
    fixed_y.append(y1)
    edges, controls = np.empty(n + 1), np.empty(n)
    for ka, kb, ya, yb in zip(fixed_k, fixed_k[1:], fixed_y, fixed_y[1:]):
        scale = (yb - ya) / (law[kb] - law[ka])
        edges[ka:kb + 1] = ya + (law[ka:kb + 1] - law[ka]) * scale
        controls[ka:kb] = ya + (mid[ka:kb] - law[ka]) * scale
    edges[0], edges[n] = y0, y1
    return edges, controls


def build_lattice(path):
    """Bound-leg ends A, B, control points P, normals N, incidences EPS (both halves) and the area S."""
    with open(path) as f:
        doc = yaml.safe_load(f)
    if doc.get("units", "m") != "m" or len(doc["surfaces"]) != 1 or not doc["surfaces"][0].get("mirror"):
        sys.exit("only one mirrored surface in metres is read")
    surface = doc["surfaces"][0]
    st = surface["stations"]
    ys = np.array([s["y"] for s in st], float)
    field = {k: np.array([s[k] for s in st], float) for k in ("chord", "nose-x", "nose-z", "twist")}
    field["twist"] = np.radians(field["twist"])
    camber = [doc["sections"][s["section"]]["camber"] for s in st]
    lattice = surface.get("lattice", {})
    if set(lattice) - {"strips", "rows"}:
        sys.exit("only lattice strips and rows are read (cosine spacing both ways)")
    n, rows = lattice.get("strips", 32), lattice.get("rows", 8)
    controls = surface.get("controls", [])

    def interval(y):  # station interval of y and the fraction along it
        i = np.clip(np.searchsorted(ys, y, side="right") - 1, 0, len(ys) - 2)
        return i, (y - ys[i]) / (ys[i + 1] - ys[i])

    def at(key, y):
        i, w = interval(y)
        return (1 - w) * field[key][i] + w * field[key][i + 1]

    cuts = [c[k] for c in controls for k in ("from", "to")]
    if len(ys) - 1 <= n // 2:
        cuts += list(ys)
    edges, yc = strip_edges(ys[0], ys[-1], n, cuts)
    y0, y1 = edges[:-1], edges[1:]
    c0, c1, x0, x1 = at("chord", y0), at("chord", y1), at("nose-x", y0), at("nose-x", y1)
    z0, z1 = at("nose-z", y0), at("nose-z", y1)
    f = (yc - y0) / (y1 - y0)
    cc, xc, zc = (1 - f) * c0 + f * c1, (1 - f) * x0 + f * x1, (1 - f) * z0 + f * z1

    # Row edges per strip (chord fractions), the hinge row edge moved on control strips.
    law = 0.5 * (1 - np.cos(np.pi * np.arange(rows + 1) / rows))
    row_edges = np.tile(law, (n, 1))
    for c in controls:
        h = 1 - c["chord-fraction"]
        r = 1 + int(np.argmin(np.abs(law[1:rows] - h)))
        edge = (h - 0.25 * law[r + 1]) / 0.75
        on = (0.5 * (y0 + y1) > c["from"]) & (0.5 * (y0 + y1) < c["to"])
        row_edges[on, r] = edge if edge > law[r - 1] + 1e-9 else h
    quarter = row_edges[:, :-1] + 0.25 * np.diff(row_edges, axis=1)  # (n, rows)
    three_quarter = row_edges[:, :-1] + 0.75 * np.diff(row_edges, axis=1)

    i, w = interval(yc)
    slope = np.empty((n, rows))
    for k in range(n):
        slope[k] = ((1 - w[k]) * naca4_slope(camber[i[k]], three_quarter[k])
                    + w[k] * naca4_slope(camber[i[k] + 1], three_quarter[k]))
    eps = at("twist", yc)[:, None] - slope

    def stack(x, y, z):  # (strips, rows) fields to (panels, 3), panel k * rows + r
        return np.stack([np.broadcast_to(v, quarter.shape) for v in (x, y, z)], axis=-1).reshape(-1, 3)

    col = np.s_[:, None]
    a = stack(x0[col] + quarter * c0[col], y0[col], z0[col])
    b = stack(x1[col] + quarter * c1[col], y1[col], z1[col])
    p = stack(xc[col] + three_quarter * cc[col], yc[col], zc[col])
    length = np.hypot(y1 - y0, z1 - z0)
    nrm = stack(0.0, (-(z1 - z0) / length)[col], ((y1 - y0) / length)[col])
    eps = eps.reshape(-1)
    # Left half: the mirror image, its bound leg still running toward +y.
    flip = np.array([1.0, -1.0, 1.0])
    a, b = np.vstack([a, b * flip]), np.vstack([b, a * flip])
    p, nrm = np.vstack([p, p * flip]), np.vstack([nrm, nrm * flip])
    eps = np.concatenate([eps, eps])
    area = 2 * np.sum(np.diff(ys) * 0.5 * (field["chord"][:-1] + field["chord"][1:]))
    return a, b, p, nrm, eps, area


def influence(a, b, p, nrm, whole=False):
    """A[i, j] = n_i . v_j(P_i): normalwash at control point i of horseshoe j at unit circulation.

    Broadcast over a few control points at a time by all panels, so that each temporary (block x panels) stays
    under 125 KiB: glibc's malloc then reuses its heap instead of mapping fresh pages for every temporary.
    Measured on the 2000-panel trainer: about 0.14 s, against 0.4 to 1.3 s for one broadcast over the whole
    matrix or blocks of 128 rows, the time going to page faults. With whole=True (--whole), the one broadcast
    over the whole matrix that a plain script writes."""
    block = len(p) if whole else max(1, 16000 // len(a))
    out = np.empty((len(p), len(a)))
    ax, ay, az, bx, by, bz = (q[None, :, k] for q in (a, b) for k in range(3))
    r0x, r0y, r0z = bx - ax, by - ay, bz - az
    for s in range(0, len(p), block):
        px, py, pz = (p[s:s + block, k, None] for k in range(3))
        nx, ny, nz = (nrm[s:s + block, k, None] for k in range(3))
        # Bound leg A -> B (Biot-Savart for a finite segment).
        r1x, r1y, r1z = px - ax, py - ay, pz - az
        r2x, r2y, r2z = px - bx, py - by, pz - bz
        cx, cy, cz = r1y * r2z - r1z * r2y, r1z * r2x - r1x * r2z, r1x * r2y - r1y * r2x
        r1 = np.sqrt(r1x * r1x + r1y * r1y + r1z * r1z)
        r2 = np.sqrt(r2x * r2x + r2y * r2y + r2z * r2z)
        w = (r0x * r1x + r0y * r1y + r0z * r1z) / r1 - (r0x * r2x + r0y * r2y + r0z * r2z) / r2
        w *= (nx * cx + ny * cy + nz * cz) / (4 * np.pi * (cx * cx + cy * cy + cz * cz))
        # Semi-infinite legs along +x: from +infinity into A, and from B to +infinity.
        for rx, ry, rz, r, sense in ((r1x, r1y, r1z, r1, -1.0), (r2x, r2y, r2z, r2, 1.0)):
            w += sense * (1 + rx / r) / (4 * np.pi * (ry * ry + rz * rz)) * (nz * ry - ny * rz)
        out[s:s + block] = w
    return out


def main():
    parser = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    parser.add_argument("wing")
    parser.add_argument("--compare", metavar="JAR", help="afterwards, compare with java -jar JAR solve")
    parser.add_argument("--whole", action="store_true",
                        help="assemble in one broadcast over the whole matrix (the plain way) instead of blocks")
    args = parser.parse_args()

    t0 = time.perf_counter()
    a, b, p, nrm, eps, area = build_lattice(args.wing)
    t1 = time.perf_counter()
    matrix = influence(a, b, p, nrm, args.whole)
    t2 = time.perf_counter()
    lu = scipy.linalg.lu_factor(matrix, overwrite_a=True, check_finite=False)
    t3 = time.perf_counter()
    alpha = np.radians(ALPHAS_DEG)
    rhs = -(np.outer(nrm[:, 0], np.cos(alpha)) + np.outer(nrm[:, 2], np.sin(alpha))) - np.outer(eps, np.cos(alpha))
    gamma = scipy.linalg.lu_solve(lu, rhs, check_finite=False)  # Gamma / V, one column per alpha
    cl = 2 * (b[:, 1] - a[:, 1]) @ gamma / area
    t4 = time.perf_counter()

    print(f"{args.wing}: {len(p)} panels, full span, S = {area:.6g} m^2")
    for deg, value in zip(ALPHAS_DEG, cl):
        print(f"  alpha {deg:5.1f} deg  CL {value: .12f}")
    print(f"imports {1e3 * (t0 - T_START):.0f} ms, build {1e3 * (t1 - t0):.0f} ms, assemble {1e3 * (t2 - t1):.0f} ms, "
          f"factor {1e3 * (t3 - t2):.0f} ms, solve {1e3 * (t4 - t3):.0f} ms, "
          f"total {1e3 * (t4 - T_START):.0f} ms (Python start not included)")

    if args.compare:
        out = subprocess.run(["java", "-jar", args.compare, "solve", args.wing, "--format", "json"],
                             check=True, capture_output=True, text=True).stdout
        points = json.loads(out)["points"]
        theirs = np.array([pt["CL"] for pt in points])
        if not np.allclose([pt["alpha_deg"] for pt in points], ALPHAS_DEG):
            sys.exit("spanlift solved other angles of attack")
        rows = len(p) // len(points[0]["span_load"]["y"])
        strip_y = p[::rows, 1]
        strip_gamma = gamma.reshape(-1, rows, len(alpha)).sum(axis=1)
        order = np.argsort(strip_y)
        their_y = np.array(points[0]["span_load"]["y"])
        their_gamma = np.array([pt["span_load"]["circulation"] for pt in points]).T
        print(f"spanlift: largest |CL difference| {np.max(np.abs(cl - theirs)):.3e}, "
              f"strip control-point y {np.max(np.abs(strip_y[order] - their_y)):.3e} m, "
              f"strip Gamma/V {np.max(np.abs(strip_gamma[order] - their_gamma)):.3e} m")


if __name__ == "__main__":
    main()
