"""Large hidden cases for manifest_pair_sums.

usage: python3 manifest_pair_sums.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE small-weights: weights up to 5000 and T in range, so there are many pairs; all-equal: every
crate weighs T/2, so every pair counts (n(n-1)/2, beyond 32 bits). The answer counts earlier
complements in a hash map (O(n)).
"""
import random
import sys
from collections import Counter


def solve(weights, target):
    seen = Counter()
    pairs = 0
    for w in weights:
        pairs += seen[target - w]
        seen[w] += 1
    return pairs


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    if mode == "small-weights":
        target = rng.randint(4000, 6000)
        weights = [rng.randint(0, 5000) for _ in range(n)]
    else:
        target = 2 * rng.randint(0, 1000000000)
        weights = [target // 2] * n
    with open(input_path, "w") as f:
        f.write(f"{n} {target}\n{' '.join(map(str, weights))}\n")
    with open(output_path, "w") as f:
        f.write(f"{solve(weights, target)}\n")


main()
