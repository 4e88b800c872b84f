# Slow on purpose (correct, O(n*k)): take the maximum of every window afresh.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, k = data[0], data[1]
h = data[2:2 + n]
best, start = None, 0
for s in range(n - k + 1):
    top = max(h[s:s + k])
    if best is None or top < best:
        best, start = top, s + 1
print(best, start)
