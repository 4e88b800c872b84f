import math
import sys


def cross(o, a, b):
    return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0])


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n = data[0]
    points = sorted(set(zip(data[1:1 + 2 * n:2], data[2:2 + 2 * n:2])))
    if len(points) == 1:
        print(f"{0:.9f}")
        return
    # Andrew's monotone chain: lower hull left to right, then upper hull right to left.
    hull = []
    for sweep in (points, points[::-1]):
        start = len(hull)
        for p in sweep:
            while len(hull) >= start + 2 and cross(hull[-2], hull[-1], p) <= 0:
                hull.pop()
            hull.append(p)
        hull.pop()  # the last point starts the other half
    length = sum(math.dist(hull[i], hull[(i + 1) % len(hull)]) for i in range(len(hull)))
    print(f"{length:.9f}")


main()
