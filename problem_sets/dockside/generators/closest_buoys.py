"""Large hidden cases for closest_buoys.

usage: python3 closest_buoys.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE spread: buoys anywhere in the grid; narrow: all buoys in a strip 2000 wide and the full
grid tall, which defeats "sort by x and stop when x is far enough" shortcuts. The answer comes
from divide and conquer on x with a merge by y (O(n log n)), in exact integer arithmetic.
"""
import math
import random
import sys
from operator import itemgetter

BY_Y = itemgetter(1)


def closest(points):
    n = len(points)
    if n <= 3:
        best = min((a[0] - b[0]) ** 2 + (a[1] - b[1]) ** 2
                   for i, a in enumerate(points) for b in points[i + 1:]) if n > 1 else math.inf
        return best, sorted(points, key=BY_Y)
    mid = n // 2
    split_x = points[mid][0]
    left_best, left = closest(points[:mid])
    right_best, right = closest(points[mid:])
    best = min(left_best, right_best)
    merged = sorted(left + right, key=BY_Y)
    strip = [p for p in merged if (p[0] - split_x) ** 2 < best]
    for i, (x1, y1) in enumerate(strip):
        for j in range(i + 1, len(strip)):
            x2, y2 = strip[j]
            dy = y2 - y1
            if dy * dy >= best:
                break
            d = (x2 - x1) ** 2 + dy * dy
            if d < best:
                best = d
    return best, merged


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    top = 1000000000
    if mode == "spread":
        pts = [(rng.randint(-top, top), rng.randint(-top, top)) for _ in range(n)]
    else:
        pts = [(rng.randint(-1000, 1000), rng.randint(-top, top)) for _ in range(n)]
    with open(input_path, "w") as f:
        f.write(f"{n}\n" + "".join(f"{x} {y}\n" for x, y in pts))
    best, _ = closest(sorted(pts))
    with open(output_path, "w") as f:
        f.write(f"{math.sqrt(best):.9f}\n")


main()
