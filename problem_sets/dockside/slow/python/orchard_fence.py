# Slow on purpose (correct, O(n * h), quadratic when most trees are on the fence): gift
# wrapping. From the current corner, the next corner is the tree that has no tree to its right
# (the farthest one if several are in line).
import math
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
pts = sorted(set(zip(data[1:1 + 2 * n:2], data[2:2 + 2 * n:2])))
length = 0.0
if len(pts) > 1:
    start = current = pts[0]
    while True:
        best = None
        for p in pts:
            if p == current:
                continue
            if best is None:
                best = p
                continue
            c = (best[0] - current[0]) * (p[1] - current[1]) - (best[1] - current[1]) * (p[0] - current[0])
            if c < 0 or (c == 0 and math.dist(current, p) > math.dist(current, best)):
                best = p
        length += math.dist(current, best)
        current = best
        if current == start:
            break
print(f"{length:.9f}")
