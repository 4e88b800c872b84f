import sys


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n, k = data[0], data[1]
    weights = sorted(data[2:2 + n], reverse=True)
    print(" ".join(map(str, weights[:k])))


main()
