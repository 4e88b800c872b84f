import sys


def check_digit(data):
    s = sum(int(c) * (3 if i % 2 == 0 else 1) for i, c in enumerate(data))
    return (10 - s % 10) % 10


def main():
    lines = sys.stdin.read().split()
    t = int(lines[0])
    out = []
    for label in lines[1:1 + t]:
        if len(label) != 8 or any(c not in "0123456789" for c in label):
            out.append("MALFORMED")
            continue
        d = check_digit(label[:7])
        out.append("OK" if int(label[7]) == d else f"BAD {d}")
    sys.stdout.write("\n".join(out) + "\n")


main()
