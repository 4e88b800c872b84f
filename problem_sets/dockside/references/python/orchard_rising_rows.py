import sys
from bisect import bisect_left


def main():
    data = sys.stdin.buffer.read().split()
    n = int(data[0])
    tails = []  # tails[k]: smallest last height of a rising selection of k + 1 trees
    for h in map(int, data[1:1 + n]):
        k = bisect_left(tails, h)
        if k == len(tails):
            tails.append(h)
        else:
            tails[k] = h
    print(len(tails))


main()
