# Wrong on purpose: a journey with the fewest ferry lines (breadth-first search), not the
# quickest one; its time is reported honestly, so the custom checker must refuse the total.
import sys
from collections import deque

data = list(map(int, sys.stdin.buffer.read().split()))
n, m = data[0], data[1]
adjacent = [[] for _ in range(n + 1)]
for i in range(m):
    u, v, w = data[2 + 3 * i: 5 + 3 * i]
    adjacent[u].append((v, w))
    adjacent[v].append((u, w))
came_from = [None] * (n + 1)
came_from[1] = (0, 0)
queue = deque([1])
while queue:
    u = queue.popleft()
    for v, w in sorted(adjacent[u], key=lambda line: line[1]):
        if came_from[v] is None:
            came_from[v] = (u, w)
            queue.append(v)
if came_from[n] is None:
    print(-1)
else:
    route, total = [n], 0
    while route[-1] != 1:
        u, w = came_from[route[-1]]
        total += w
        route.append(u)
    print(total)
    print(*reversed(route))
