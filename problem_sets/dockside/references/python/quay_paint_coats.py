import sys
from itertools import accumulate


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n, m, k = data[0], data[1], data[2]
    change = [0] * (n + 2)  # coats added at a segment minus coats ending just before it
    for j in range(m):
        change[data[3 + 2 * j]] += 1
        change[data[4 + 2 * j] + 1] -= 1
    coats = accumulate(change[1:n + 1])
    print(sum(1 for c in coats if c >= k))


main()
