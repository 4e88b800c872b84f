# Slow on purpose (correct, O(n * (answer - lower bound))): try every capacity upward from a
# lower bound until one is enough.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, d = data[0], data[1]
weights = data[2:2 + n]
capacity = max(max(weights), (sum(weights) + d - 1) // d)
while True:
    trips, load = 1, 0
    for w in weights:
        if load + w > capacity:
            trips += 1
            load = 0
        load += w
    if trips <= d:
        break
    capacity += 1
print(capacity)
