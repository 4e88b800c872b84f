# Wrong on purpose: the right quickest time, but the route printed is just "1 n", which is only
# right when a quickest direct line exists. The custom checker must check the route itself.
import heapq
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, m = data[0], data[1]
adjacent = [[] for _ in range(n + 1)]
for i in range(m):
    u, v, w = data[2 + 3 * i: 5 + 3 * i]
    adjacent[u].append((v, w))
    adjacent[v].append((u, w))
dist = {1: 0}
heap = [(0, 1)]
while heap:
    d, u = heapq.heappop(heap)
    if d > dist[u]:
        continue
    for v, w in adjacent[u]:
        if v not in dist or d + w < dist[v]:
            dist[v] = d + w
            heapq.heappush(heap, (d + w, v))
if n not in dist:
    print(-1)
else:
    print(dist[n])
    print(1, n)
