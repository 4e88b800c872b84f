import sys


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n = data[0]
    sx = sy = total = 0
    for i in range(n):
        x, y, w = data[1 + 3 * i: 4 + 3 * i]
        sx += w * x
        sy += w * y
        total += w
    print(f"{sx / total:.9f} {sy / total:.9f}")


main()
