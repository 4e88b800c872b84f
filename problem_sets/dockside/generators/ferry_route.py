"""Large hidden cases for ferry_route.

usage: python3 ferry_route.py N M SEED MODE INPUT_PATH OUTPUT_PATH
MODE random: a random connected network; apart: the same, but harbour n lies in a separate
group of islands, so the answer is -1; coast: a chain of short hops along the coast with long
slow lines across, so the quickest journey visits many harbours. The expected output is one
quickest journey found with Dijkstra's algorithm and a binary heap (O(m log n)); the checker
accepts any journey as quick.
"""
import heapq
import random
import sys


def solve(n, lines):
    adjacent = [[] for _ in range(n + 1)]
    for u, v, w in lines:
        adjacent[u].append((v, w))
        adjacent[v].append((u, w))
    dist = [None] * (n + 1)
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
            if dist[v] is None or d + w < dist[v]:
                dist[v] = d + w
                came_from[v] = u
                heapq.heappush(heap, (d + w, v))
    if dist[n] is None:
        return "-1\n"
    route = [n]
    while route[-1] != 1:
        route.append(came_from[route[-1]])
    return f"{dist[n]}\n{' '.join(map(str, reversed(route)))}\n"


def main():
    n, m, seed, mode, input_path, output_path = sys.argv[1:]
    n, m, rng = int(n), int(m), random.Random(int(seed))
    lines = []
    if mode == "coast":
        for v in range(2, n + 1):
            lines.append((v - 1, v, rng.randint(1, 20)))
        while len(lines) < m:
            u = rng.randint(1, n - 1)
            v = rng.randint(u + 1, n)
            lines.append((u, v, 20 * (v - u) + rng.randint(1, 1000)))
    else:
        cut = n // 2 if mode == "apart" else n  # harbours above the cut form their own group
        for v in range(2, n + 1):
            low, high = (1, v - 1) if v <= cut else (cut + 1, v - 1)
            if v == cut + 1:
                continue
            lines.append((rng.randint(low, high), v, rng.randint(1, 1000000)))
        while len(lines) < m:
            u = rng.randint(1, n)
            low, high = (1, cut) if u <= cut else (cut + 1, n)
            v = rng.randint(low, high)
            if u != v:
                lines.append((u, v, rng.randint(1, 1000000)))
    rng.shuffle(lines)
    lines = [(v, u, w) if rng.random() < 0.5 else (u, v, w) for u, v, w in lines]
    with open(input_path, "w") as f:
        f.write(f"{n} {len(lines)}\n" + "".join(f"{u} {v} {w}\n" for u, v, w in lines))
    with open(output_path, "w") as f:
        f.write(solve(n, lines))


main()
