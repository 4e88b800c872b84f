import sys
from math import gcd


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n = data[0]
    t = 1
    for p in data[1:1 + n]:
        t = t // gcd(t, p) * p
    print(t)


main()
