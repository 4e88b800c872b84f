"""Large hidden cases for unloading_order.

usage: python3 unloading_order.py N M SEED MODE INPUT_PATH OUTPUT_PATH
MODE random: rules between random crates, all agreeing with one hidden random order; chain: the
hidden order is n, n-1, ..., 1 and links every neighbour in it, so one crate at a time becomes
free and it is always the highest-numbered one left; cycle: like random, plus rules that close a
long cycle, so the answer is STUCK. The expected output comes from Kahn's algorithm (O(n + m));
the checker accepts any valid order.
"""
import random
import sys
from collections import deque


def solve(n, rules):
    after = [[] for _ in range(n + 1)]
    waiting_on = [0] * (n + 1)
    for a, b in rules:
        after[a].append(b)
        waiting_on[b] += 1
    ready = deque(c for c in range(1, n + 1) if waiting_on[c] == 0)
    order = []
    while ready:
        c = ready.popleft()
        order.append(c)
        for d in after[c]:
            waiting_on[d] -= 1
            if waiting_on[d] == 0:
                ready.append(d)
    return " ".join(map(str, order)) + "\n" if len(order) == n else "STUCK\n"


def main():
    n, m, seed, mode, input_path, output_path = sys.argv[1:]
    n, m, rng = int(n), int(m), random.Random(int(seed))
    if mode == "chain":
        hidden = list(range(n, 0, -1))
    else:
        hidden = list(range(1, n + 1))
        rng.shuffle(hidden)
    rules = []
    if mode == "chain":
        rules = [(hidden[i], hidden[i + 1]) for i in range(n - 1)]
    if mode == "cycle":
        step = n // 50
        for i in range(0, n - step, step):
            rules.append((hidden[i], hidden[i + step]))
        rules.append((hidden[(n - step - 1) // step * step], hidden[0]))
    while len(rules) < m:
        i, j = rng.randrange(n), rng.randrange(n)
        if i != j:
            i, j = min(i, j), max(i, j)
            rules.append((hidden[i], hidden[j]))
    rng.shuffle(rules)
    with open(input_path, "w") as f:
        f.write(f"{n} {len(rules)}\n" + "".join(f"{a} {b}\n" for a, b in rules))
    with open(output_path, "w") as f:
        f.write(solve(n, rules))


main()
