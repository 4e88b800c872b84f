"""Large hidden cases for tide_interpolation.

usage: python3 tide_interpolation.py N Q SEED MODE INPUT_PATH OUTPUT_PATH
A semidiurnal-looking tide curve sampled at irregular moments. MODE anywhere: questions spread
over the whole table; late: questions in the last hundredth of the table, where a walk from
the start is longest. Answers use binary search over the moments (O((n + q) log n)).
"""
import math
import random
import sys
from bisect import bisect_right


def solve(t, h, questions):
    n = len(t)
    out = []
    for x in questions:
        i = bisect_right(t, x) - 1
        if i == n - 1:
            out.append(f"{h[i]:.9f}")
        else:
            out.append(f"{h[i] + (h[i + 1] - h[i]) * (x - t[i]) / (t[i + 1] - t[i]):.9f}")
    return "\n".join(out) + "\n"


def main():
    n, q, seed, mode, input_path, output_path = sys.argv[1:]
    n, q, rng = int(n), int(q), random.Random(int(seed))
    t, moment = [], rng.randint(0, 1000)
    for _ in range(n):
        t.append(moment)
        moment += rng.randint(1, 6000)
    h = [max(-5000, min(5000, int(4200 * math.sin(x / 745.0 * 2 * math.pi / 60) + rng.randint(-300, 300))))
         for x in t]
    low = t[0] if mode == "anywhere" else t[n - n // 100]
    questions = [rng.randint(low, t[-1]) for _ in range(q)]
    with open(input_path, "w") as f:
        f.write(f"{n}\n" + "".join(f"{a} {b}\n" for a, b in zip(t, h)) + f"{q}\n"
                + "".join(f"{x}\n" for x in questions))
    with open(output_path, "w") as f:
        f.write(solve(t, h, questions))


main()
