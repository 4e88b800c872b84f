"""Large hidden cases for channel_diameter.

usage: python3 channel_diameter.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE random: each islet joins a random earlier one (a shallow tree); long: a path of about n/2
islets with short side branches, so walks are deep (a recursive walk would overflow the stack).
Islets are renumbered at random. The answer is found with two walks from a farthest islet
(O(n)); walking from every islet is O(n^2).
"""
import random
import sys


def solve(n, channels):
    adjacent = [[] for _ in range(n + 1)]
    for a, b, c in channels:
        adjacent[a].append((b, c))
        adjacent[b].append((a, c))

    def farthest(source):
        dist = [-1] * (n + 1)
        dist[source] = 0
        stack = [source]
        while stack:
            u = stack.pop()
            for v, c in adjacent[u]:
                if dist[v] < 0:
                    dist[v] = dist[u] + c
                    stack.append(v)
        best = max(range(1, n + 1), key=dist.__getitem__)
        return best, dist[best]

    end, _ = farthest(1)
    return farthest(end)[1]


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    label = list(range(1, n + 1))
    rng.shuffle(label)
    channels = []
    spine = n // 2
    for v in range(1, n):
        if mode == "random":
            parent = rng.randrange(v)
        elif v < spine:
            parent = v - 1
        else:
            parent = rng.randrange(v)
        channels.append((label[v], label[parent], rng.randint(1, 1000000)))
    rng.shuffle(channels)
    with open(input_path, "w") as f:
        f.write(f"{n}\n" + "".join(f"{a} {b} {c}\n" for a, b, c in channels))
    with open(output_path, "w") as f:
        f.write(f"{solve(n, channels)}\n")


main()
