"""Large hidden cases for pier_walkways.

usage: python3 pier_walkways.py N M SEED MODE INPUT_PATH OUTPUT_PATH
MODE random: walkways between random piers; late: a random spanning tree whose last edge
links two halves is built in random order among wasted walkways inside each half, so the piers
join only near the end. Answers come from union-find with union by size and path compression.
"""
import random
import sys


def solve(n, walkways):
    parent = list(range(n + 1))
    size = [1] * (n + 1)

    def find(x):
        root = x
        while parent[root] != root:
            root = parent[root]
        while parent[x] != root:
            parent[x], x = root, parent[x]
        return root

    groups, joined, wasted = n, (0 if n == 1 else -1), 0
    for j, (u, v) in enumerate(walkways, start=1):
        a, b = find(u), find(v)
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
    return f"{joined} {wasted}\n"


def main():
    n, m, seed, mode, input_path, output_path = sys.argv[1:]
    n, m, rng = int(n), int(m), random.Random(int(seed))
    if mode == "random":
        walkways = [(rng.randint(1, n), rng.randint(1, n)) for _ in range(m)]
    else:
        half = n // 2
        piers = list(range(1, n + 1))
        rng.shuffle(piers)
        low, high = piers[:half], piers[half:]
        tree = [(low[i], low[rng.randrange(i)]) for i in range(1, half)]
        tree += [(high[i], high[rng.randrange(i)]) for i in range(1, n - half)]
        extra = m - len(tree) - 1
        inside = [(lambda g: (rng.choice(g), rng.choice(g)))(low if rng.random() < 0.5 else high)
                  for _ in range(extra)]
        walkways = tree + inside
        rng.shuffle(walkways)
        walkways.append((rng.choice(low), rng.choice(high)))
    with open(input_path, "w") as f:
        f.write(f"{n} {len(walkways)}\n" + "".join(f"{u} {v}\n" for u, v in walkways))
    with open(output_path, "w") as f:
        f.write(solve(n, walkways))


main()
