import sys


def main():
    data = sys.stdin.read().split()
    n = int(data[0])
    groups = {}
    for label in data[1:1 + n]:
        groups.setdefault("".join(sorted(label)), []).append(label)
    lines = [" ".join(sorted(g)) for g in groups.values() if len(g) >= 2]
    sys.stdout.write("\n".join(lines) + "\n" if lines else "NONE\n")


main()
