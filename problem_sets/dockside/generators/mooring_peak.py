"""Large hidden cases for mooring_peak.

usage: python3 mooring_peak.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE random: stays of random length anywhere in the log; nested: long stays that mostly
overlap, so that many boats are moored at once. The answer is computed by a sweep over the
sorted arrivals and departures (O(n log n)).
"""
import random
import sys


def solve(boats):
    arrivals = sorted(a for a, _ in boats)
    departures = sorted(b for _, b in boats)
    best, when, current, j = 0, 0, 0, 0
    for t in arrivals:
        while departures[j] <= t:
            current -= 1
            j += 1
        current += 1
        if current > best:
            best, when = current, t
    return best, when


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    top = 1000000000
    boats = []
    for _ in range(n):
        if mode == "random":
            a = rng.randrange(0, top - 1)
            b = min(top, a + 1 + rng.randrange(0, 20000000))
        else:
            a = rng.randrange(0, top // 2)
            b = rng.randrange(top // 2 + 1, top + 1)
        boats.append((a, b))
    with open(input_path, "w") as f:
        f.write(f"{n}\n" + "".join(f"{a} {b}\n" for a, b in boats))
    best, when = solve(boats)
    with open(output_path, "w") as f:
        f.write(f"{best} {when}\n")


main()
