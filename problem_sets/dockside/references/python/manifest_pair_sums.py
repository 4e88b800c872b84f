import sys
from collections import Counter


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n, target = data[0], data[1]
    seen = Counter()
    pairs = 0
    for w in data[2:2 + n]:
        pairs += seen[target - w]  # earlier crates that complete this one
        seen[w] += 1
    print(pairs)


main()
