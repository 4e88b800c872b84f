# Wrong on purpose: gives the height of the last listed moment at or before x, without
# interpolating, as if the tide moved in steps.
import sys
from bisect import bisect_right

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
t, h = data[1:1 + 2 * n:2], data[2:2 + 2 * n:2]
q = data[1 + 2 * n]
print("\n".join(f"{h[bisect_right(t, x) - 1]:.6f}" for x in data[2 + 2 * n:2 + 2 * n + q]))
