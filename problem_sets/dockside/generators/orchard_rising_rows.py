"""Large hidden cases for orchard_rising_rows.

usage: python3 orchard_rising_rows.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE random: independent heights; climbing: a noisy upward trend with repeated heights, so the
answer is long. The answer is the length of the longest strictly increasing subsequence,
found with the tails array and binary search (O(n log n)).
"""
import random
import sys
from bisect import bisect_left


def solve(heights):
    tails = []
    for h in heights:
        k = bisect_left(tails, h)
        if k == len(tails):
            tails.append(h)
        else:
            tails[k] = h
    return len(tails)


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    if mode == "random":
        h = [rng.randint(1, 1000000000) for _ in range(n)]
    else:
        h = [min(1000000000, 1 + i * 4000 + rng.randint(0, 30000) // 1000 * 1000) for i in range(n)]
    with open(input_path, "w") as f:
        f.write(f"{n}\n{' '.join(map(str, h))}\n")
    with open(output_path, "w") as f:
        f.write(f"{solve(h)}\n")


main()
