"""Large hidden cases for berth_assignment.

usage: python3 berth_assignment.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE busy: long stays, so thousands of berths are needed; quiet: short stays with many
arrivals at the very time another ship leaves. The expected output is one plan with the fewest
berths, from the greedy by arrival with a heap of berths keyed by the time they free
(O(n log n)); the checker accepts any plan with that many berths.
"""
import heapq
import random
import sys


def solve(stays):
    n = len(stays)
    berth = [0] * n
    in_use = []
    count = 0
    for i in sorted(range(n), key=lambda s: stays[s][0]):
        if in_use and in_use[0][0] <= stays[i][0]:
            _, b = heapq.heappop(in_use)
        else:
            count += 1
            b = count
        berth[i] = b
        heapq.heappush(in_use, (stays[i][1], b))
    return f"{count}\n{' '.join(map(str, berth))}\n"


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    stays = []
    for _ in range(n):
        if mode == "busy":
            a = rng.randrange(0, 900000000)
            stays.append((a, a + rng.randint(1, 100000000)))
        else:
            a = rng.randrange(0, 1000) * 1000
            stays.append((a, a + rng.randint(1, 5) * 1000))
    with open(input_path, "w") as f:
        f.write(f"{n}\n" + "".join(f"{a} {b}\n" for a, b in stays))
    with open(output_path, "w") as f:
        f.write(solve(stays))


main()
