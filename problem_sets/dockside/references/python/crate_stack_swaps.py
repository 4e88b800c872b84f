import sys


def main():
    data = sys.stdin.buffer.read().split()
    n = int(data[0])
    w = list(map(int, data[1:1 + n]))
    rank = {v: i + 1 for i, v in enumerate(sorted(set(w)))}
    size = len(rank)
    tree = [0] * (size + 1)  # Fenwick tree of counts by weight rank
    swaps = 0
    for seen, v in enumerate(w):
        r = rank[v]
        i, not_heavier = r, 0
        while i > 0:
            not_heavier += tree[i]
            i &= i - 1
        swaps += seen - not_heavier  # earlier crates heavier than this one
        while r <= size:
            tree[r] += 1
            r += r & -r
    print(swaps)


main()
