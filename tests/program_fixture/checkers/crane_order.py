"""Custom checker: checker INPUT EXPECTED ACTUAL; exit 0 accepts, 1 rejects, else a checker failure."""
import sys


def reject(message):
    print(message)
    sys.exit(1)


with open(sys.argv[1]) as handle:
    tokens = handle.read().split()
n, weights = int(tokens[0]), [int(t) for t in tokens[1:]]
with open(sys.argv[3]) as handle:
    lines = handle.read().split("\n")
while lines and not lines[-1].strip():
    lines.pop()
if len(lines) != 1:
    reject(f"expected one line, got {len(lines)}")
try:
    order = [int(t) for t in lines[0].split()]
except ValueError:
    reject("a crate number is not an integer")
if sorted(order) != list(range(1, n + 1)):
    reject("not every crate exactly once")
for before, after in zip(order, order[1:]):
    if weights[before - 1] > weights[after - 1]:
        reject(f"crate {before} (weight {weights[before - 1]}) is lifted before the lighter crate {after}")
print("ok")
