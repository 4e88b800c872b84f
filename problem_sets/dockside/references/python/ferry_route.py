import heapq
import sys


def main():
    data = sys.stdin.buffer.read().split()
    n, m = int(data[0]), int(data[1])
    values = list(map(int, data[2:2 + 3 * m]))
    adjacent = [[] for _ in range(n + 1)]
    for i in range(0, 3 * m, 3):
        u, v, w = values[i], values[i + 1], values[i + 2]
        adjacent[u].append((v, w))
        adjacent[v].append((u, w))
    unreached = float("inf")
    dist = [unreached] * (n + 1)
    came_from = [0] * (n + 1)
    dist[1] = 0
    heap = [(0, 1)]
    while heap:
        d, u = heapq.heappop(heap)
        if d > dist[u]:
            continue
        if u == n:
            break
        for v, w in adjacent[u]:
            nd = d + w
            if nd < dist[v]:
                dist[v] = nd
                came_from[v] = u
                heapq.heappush(heap, (nd, v))
    if dist[n] == unreached:
        print(-1)
        return
    route = [n]
    while route[-1] != 1:
        route.append(came_from[route[-1]])
    route.reverse()
    sys.stdout.write(f"{dist[n]}\n{' '.join(map(str, route))}\n")


main()
