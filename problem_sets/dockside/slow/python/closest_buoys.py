# Slow on purpose (correct, quadratic): every pair of buoys.
import math
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
xs, ys = data[1:1 + 2 * n:2], data[2:2 + 2 * n:2]
best = min((xs[i] - xs[j]) ** 2 + (ys[i] - ys[j]) ** 2 for i in range(n) for j in range(i + 1, n))
print(f"{math.sqrt(best):.9f}")
