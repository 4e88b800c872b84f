# Slow on purpose (correct, O(total painted length)): paint every segment of every job.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, m, k = data[0], data[1], data[2]
coats = [0] * (n + 1)
for j in range(m):
    for s in range(data[3 + 2 * j], data[4 + 2 * j] + 1):
        coats[s] += 1
print(sum(1 for c in coats[1:] if c >= k))
