# Slow on purpose (correct, quadratic): best[i] = longest rising selection ending at tree i.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
h = data[1:1 + n]
best = [1] * n
for i in range(n):
    for j in range(i):
        if h[j] < h[i] and best[j] + 1 > best[i]:
            best[i] = best[j] + 1
print(max(best))
