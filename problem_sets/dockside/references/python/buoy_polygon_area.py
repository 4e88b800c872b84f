import sys


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n = data[0]
    xs, ys = data[1:1 + 2 * n:2], data[2:2 + 2 * n:2]
    # Shoelace formula: twice the signed area, in exact integers.
    twice = abs(sum(xs[i] * ys[(i + 1) % n] - xs[(i + 1) % n] * ys[i] for i in range(n)))
    print(f"{twice // 2}.5" if twice % 2 else twice // 2)


main()
