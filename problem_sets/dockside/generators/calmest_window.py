"""Large hidden cases for calmest_window.

usage: python3 calmest_window.py N SEED K INPUT_PATH OUTPUT_PATH
Wave heights follow a slow swell with noise, so window maxima vary. The answer is found with a
monotonic deque of window maxima (O(n)); a window of K = n/2 makes the O(n*k) rescan quadratic.
"""
import math
import random
import sys
from collections import deque


def solve(h, k):
    window = deque()
    best, start = None, 0
    for i, x in enumerate(h):
        while window and h[window[-1]] <= x:
            window.pop()
        window.append(i)
        if window[0] <= i - k:
            window.popleft()
        if i >= k - 1:
            top = h[window[0]]
            if best is None or top < best:
                best, start = top, i - k + 2
    return best, start


def main():
    n, seed, k, input_path, output_path = sys.argv[1:]
    n, k, rng = int(n), int(k), random.Random(int(seed))
    h = [int(500000000 + 400000000 * math.sin(i / 40000.0) + rng.randint(0, 90000000)) for i in range(n)]
    with open(input_path, "w") as f:
        f.write(f"{n} {k}\n{' '.join(map(str, h))}\n")
    best, start = solve(h, k)
    with open(output_path, "w") as f:
        f.write(f"{best} {start}\n")


main()
