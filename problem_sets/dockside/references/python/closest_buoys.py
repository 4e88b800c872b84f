import math
import sys
from operator import itemgetter

BY_Y = itemgetter(1)


def closest(points):
    """Smallest squared distance among points sorted by x, and the points sorted by y."""
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
    merged = sorted(left + right, key=BY_Y)  # two sorted runs: a linear merge
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
    data = list(map(int, sys.stdin.buffer.read().split()))
    n = data[0]
    points = sorted(zip(data[1:1 + 2 * n:2], data[2:2 + 2 * n:2]))
    best, _ = closest(points)
    print(f"{math.sqrt(best):.9f}")


main()
