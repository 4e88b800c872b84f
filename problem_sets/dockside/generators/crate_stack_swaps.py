"""Large hidden cases for crate_stack_swaps.

usage: python3 crate_stack_swaps.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE random: independent weights (some repeated); reversed: a non-increasing row with ties,
whose answer is near n*n/2 and overflows 32 bits. The answer is counted with a Fenwick tree
over weight ranks (O(n log n)).
"""
import random
import sys


def solve(w):
    rank = {v: i + 1 for i, v in enumerate(sorted(set(w)))}
    size = len(rank)
    tree = [0] * (size + 1)
    swaps = 0
    for seen, v in enumerate(w):
        r = rank[v]
        i, not_heavier = r, 0
        while i > 0:
            not_heavier += tree[i]
            i &= i - 1
        swaps += seen - not_heavier
        while r <= size:
            tree[r] += 1
            r += r & -r
    return swaps


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    if mode == "random":
        w = [rng.randint(1, 1000000000) if rng.random() < 0.7 else rng.randint(1, 1000) for _ in range(n)]
    else:
        w = sorted((rng.randint(1, 1000000000) for _ in range(n)), reverse=True)
        for i in range(0, n - 1, 50):  # some equal neighbours, which need no swap
            w[i + 1] = w[i]
    with open(input_path, "w") as f:
        f.write(f"{n}\n{' '.join(map(str, w))}\n")
    with open(output_path, "w") as f:
        f.write(f"{solve(w)}\n")


main()
