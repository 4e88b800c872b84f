import sys


def main():
    data = sys.stdin.read().split()
    n = int(data[0])
    shifts = [(data[1 + 3 * i], int(data[2 + 3 * i]), int(data[3 + 3 * i])) for i in range(n)]
    pairs = []
    for i in range(n):
        for j in range(i + 1, n):
            a, s1, e1 = shifts[i]
            b, s2, e2 = shifts[j]
            if max(s1, s2) < min(e1, e2):
                pairs.append(f"{min(a, b)} {max(a, b)}")
    sys.stdout.write("\n".join(pairs) + "\n" if pairs else "NONE\n")


main()
