# Slow on purpose (correct, quadratic): walk the whole marsh from every islet.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
adjacent = [[] for _ in range(n + 1)]
for i in range(n - 1):
    a, b, c = data[1 + 3 * i: 4 + 3 * i]
    adjacent[a].append((b, c))
    adjacent[b].append((a, c))
best = 0
for source in range(1, n + 1):
    dist = {source: 0}
    stack = [source]
    while stack:
        u = stack.pop()
        for v, c in adjacent[u]:
            if v not in dist:
                dist[v] = dist[u] + c
                stack.append(v)
    best = max(best, max(dist.values()))
print(best)
