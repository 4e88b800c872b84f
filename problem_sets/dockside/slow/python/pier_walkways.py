# Slow on purpose (correct, O(n*m)): keep a group label per pier and relabel every pier of one
# group when a walkway joins two groups.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, m = data[0], data[1]
label = list(range(n + 1))
groups, joined, wasted = n, (0 if n == 1 else -1), 0
for j in range(1, m + 1):
    a, b = label[data[2 * j]], label[data[2 * j + 1]]
    if a == b:
        wasted += 1
        continue
    for p in range(1, n + 1):
        if label[p] == b:
            label[p] = a
    groups -= 1
    if groups == 1:
        joined = j
print(joined, wasted)
