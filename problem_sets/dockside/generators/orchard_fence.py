"""Large hidden cases for orchard_fence.

usage: python3 orchard_fence.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE scatter: trees anywhere in a disc; convex: about half the trees are corners of one large
convex lattice polygon (edges are distinct primitive vectors sorted by angle) and the rest stand
inside it, so gift wrapping needs O(n^2) steps. The answer uses Andrew's monotone chain
(O(n log n)) in exact integer arithmetic.
"""
import math
import random
import sys


def cross(o, a, b):
    return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0])


def solve(points):
    points = sorted(set(points))
    if len(points) == 1:
        return 0.0
    hull = []
    for sweep in (points, points[::-1]):
        start = len(hull)
        for p in sweep:
            while len(hull) >= start + 2 and cross(hull[-2], hull[-1], p) <= 0:
                hull.pop()
            hull.append(p)
        hull.pop()
    return sum(math.dist(hull[i], hull[(i + 1) % len(hull)]) for i in range(len(hull)))


def convex_polygon(corners, rng):
    """About `corners` corners of a convex lattice polygon centred near the origin."""
    # about 6/pi^2 of the (2r + 1)^2 vectors with coordinates up to r are primitive
    vectors, reach = [], max(1, int(math.sqrt(corners * math.pi ** 2 / 6) / 2) - 3)
    while len(vectors) < corners:
        reach += 1
        vectors = [(a, b) for a in range(-reach, reach + 1) for b in range(-reach, reach + 1)
                   if (a, b) != (0, 0) and math.gcd(a, b) == 1]
    vectors.sort(key=lambda v: math.atan2(v[1], v[0]))  # every primitive vector once: sums to 0
    x = y = 0
    polygon = []
    for dx, dy in vectors:
        polygon.append((x, y))
        x, y = x + dx, y + dy
    cx = sum(p[0] for p in polygon) // len(polygon)
    cy = sum(p[1] for p in polygon) // len(polygon)
    return [(px - cx, py - cy) for px, py in polygon]


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    top = 10000000
    if mode == "scatter":
        pts = []
        while len(pts) < n:
            x, y = rng.randint(-top, top), rng.randint(-top, top)
            if x * x + y * y <= top * top:
                pts.append((x, y))
    else:
        polygon = convex_polygon(n // 2, rng)
        radius = min(max(abs(x), abs(y)) for x, y in polygon) // 2  # a square well inside it
        pts = polygon + [(rng.randint(-radius, radius), rng.randint(-radius, radius))
                         for _ in range(n - len(polygon))]
        assert all(abs(x) <= top and abs(y) <= top for x, y in pts)
    rng.shuffle(pts)
    with open(input_path, "w") as f:
        f.write(f"{len(pts)}\n" + "".join(f"{x} {y}\n" for x, y in pts))
    with open(output_path, "w") as f:
        f.write(f"{solve(pts):.9f}\n")


main()
