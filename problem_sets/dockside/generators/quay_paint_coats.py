"""Large hidden cases for quay_paint_coats.

usage: python3 quay_paint_coats.py N M SEED MODE INPUT_PATH OUTPUT_PATH
MODE long: jobs a third of the wall long on average; mixed: half the jobs short, half long.
k is chosen near the typical number of coats so the count is neither 0 nor n. The answer uses a
difference array and one running sum (O(n + m)); painting job by job is O(n * m).
"""
import random
import sys
from itertools import accumulate


def solve(n, k, jobs):
    change = [0] * (n + 2)
    for l, r in jobs:
        change[l] += 1
        change[r + 1] -= 1
    return sum(1 for c in accumulate(change[1:n + 1]) if c >= k)


def main():
    n, m, seed, mode, input_path, output_path = sys.argv[1:]
    n, m, rng = int(n), int(m), random.Random(int(seed))
    jobs = []
    for j in range(m):
        if mode == "long" or j % 2 == 0:
            length = rng.randint(n // 6, n // 2)
        else:
            length = rng.randint(1, 1000)
        l = rng.randint(1, n - length + 1)
        jobs.append((l, l + length - 1))
    k = 30000 if mode == "long" else 15000
    with open(input_path, "w") as f:
        f.write(f"{n} {m} {k}\n" + "".join(f"{l} {r}\n" for l, r in jobs))
    with open(output_path, "w") as f:
        f.write(f"{solve(n, k, jobs)}\n")


main()
