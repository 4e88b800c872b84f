import sys


def farthest(n, adjacent, source):
    """The islet farthest from source and its distance, by an explicit-stack walk."""
    dist = [-1] * (n + 1)
    dist[source] = 0
    stack = [source]
    while stack:
        u = stack.pop()
        for v, c in adjacent[u]:
            if dist[v] < 0:
                dist[v] = dist[u] + c
                stack.append(v)
    best = max(range(1, n + 1), key=dist.__getitem__)
    return best, dist[best]


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n = data[0]
    adjacent = [[] for _ in range(n + 1)]
    for i in range(n - 1):
        a, b, c = data[1 + 3 * i: 4 + 3 * i]
        adjacent[a].append((b, c))
        adjacent[b].append((a, c))
    # The islet farthest from any islet is an end of a longest route.
    end, _ = farthest(n, adjacent, 1)
    _, length = farthest(n, adjacent, end)
    print(length)


main()
