# Slow on purpose (correct, O(n^2)): Dijkstra's algorithm without a heap, scanning every
# harbour for the nearest unsettled one.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, m = data[0], data[1]
adjacent = [[] for _ in range(n + 1)]
for i in range(m):
    u, v, w = data[2 + 3 * i: 5 + 3 * i]
    adjacent[u].append((v, w))
    adjacent[v].append((u, w))
dist = [None] * (n + 1)
came_from = [0] * (n + 1)
settled = [False] * (n + 1)
dist[1] = 0
while True:
    u = None
    for v in range(1, n + 1):
        if not settled[v] and dist[v] is not None and (u is None or dist[v] < dist[u]):
            u = v
    if u is None or u == n:
        break
    settled[u] = True
    for v, w in adjacent[u]:
        if dist[v] is None or dist[u] + w < dist[v]:
            dist[v] = dist[u] + w
            came_from[v] = u
if dist[n] is None:
    print(-1)
else:
    route = [n]
    while route[-1] != 1:
        route.append(came_from[route[-1]])
    print(dist[n])
    print(*reversed(route))
