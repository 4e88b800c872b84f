import sys


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    t = data[0]
    out = []
    for k in range(t):
        a, c, s, b = data[1 + 4 * k: 5 + 4 * k]
        pence = 450 * a + 225 * c + 310 * s + 105 * b
        if a + c + s >= 10:
            pence = (pence * 9 + 5) // 10  # 90%, half a penny rounded up
        out.append(f"{pence // 100}.{pence % 100:02d}")
    sys.stdout.write("\n".join(out) + "\n")


main()
