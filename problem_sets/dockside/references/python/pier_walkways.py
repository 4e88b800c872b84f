import sys


def main():
    data = sys.stdin.buffer.read().split()
    n, m = int(data[0]), int(data[1])
    parent = list(range(n + 1))

    def find(x):
        root = x
        while parent[root] != root:
            root = parent[root]
        while parent[x] != root:  # path compression
            parent[x], x = root, parent[x]
        return root

    groups, joined, wasted = n, (0 if n == 1 else -1), 0
    size = [1] * (n + 1)
    for j in range(1, m + 1):
        a, b = find(int(data[2 * j])), find(int(data[2 * j + 1]))
        if a == b:
            wasted += 1
            continue
        if size[a] < size[b]:
            a, b = b, a
        parent[b] = a
        size[a] += size[b]
        groups -= 1
        if groups == 1:
            joined = j
    print(joined, wasted)


main()
