"""A large berth_sums case: python3 berth_sums.py N Q SEED INPUT OUTPUT (answer by prefix sums)."""
import random
import sys

n, q, seed = (int(a) for a in sys.argv[1:4])
rng = random.Random(seed)
weights = [rng.randint(0, 1_000_000) for _ in range(n)]
queries = []
for _ in range(q):
    left = rng.randint(1, n)
    queries.append((left, rng.randint(left, n)))
capacity = 500_000 * n // 3
prefix = [0]
for w in weights:
    prefix.append(prefix[-1] + w)
answer = sum(prefix[r] - prefix[l - 1] > capacity for l, r in queries)
with open(sys.argv[4], "w") as handle:
    handle.write(f"{n} {q} {capacity}\n" + " ".join(map(str, weights)) + "\n")
    handle.write("".join(f"{l} {r}\n" for l, r in queries))
with open(sys.argv[5], "w") as handle:
    handle.write(f"{answer}\n")
