import sys
from bisect import bisect_right


def main():
    data = sys.stdin.buffer.read().split()
    n = int(data[0])
    t = list(map(int, data[1:1 + 2 * n:2]))
    h = list(map(int, data[2:2 + 2 * n:2]))
    q = int(data[1 + 2 * n])
    out = []
    for x in map(int, data[2 + 2 * n:2 + 2 * n + q]):
        i = bisect_right(t, x) - 1  # t[i] <= x < t[i + 1], or x == t[n - 1]
        if i == n - 1:
            out.append(f"{h[i]:.9f}")
        else:
            out.append(f"{h[i] + (h[i + 1] - h[i]) * (x - t[i]) / (t[i + 1] - t[i]):.9f}")
    sys.stdout.write("\n".join(out) + "\n")


main()
