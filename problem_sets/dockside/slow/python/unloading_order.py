# Slow on purpose (correct, O(n * (n + m))): again and again, look through the crates still in
# the hold for the first one whose earlier crates have all gone.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, m = data[0], data[1]
before = [[] for _ in range(n + 1)]
for i in range(m):
    before[data[3 + 2 * i]].append(data[2 + 2 * i])
gone = [False] * (n + 1)
order = []
for _ in range(n):
    pick = next((c for c in range(1, n + 1) if not gone[c] and all(gone[a] for a in before[c])), None)
    if pick is None:
        break
    gone[pick] = True
    order.append(pick)
print(" ".join(map(str, order)) if len(order) == n else "STUCK")
