import sys


def main():
    data = sys.stdin.read().split()
    n = int(data[0])
    totals = {}
    for i in range(n):
        name, kg = data[1 + 2 * i], int(data[2 + 2 * i])
        total, baskets = totals.get(name, (0, 0))
        totals[name] = (total + kg, baskets + 1)
    sys.stdout.write("".join(f"{name} {t} {b}\n" for name, (t, b) in totals.items()))


main()
