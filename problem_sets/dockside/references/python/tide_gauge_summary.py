import sys


def main():
    data = sys.stdin.buffer.read().split()
    n = int(data[0])
    h = list(map(int, data[1:1 + n]))
    rises = sum(1 for i in range(1, n) if h[i] > h[i - 1])
    sys.stdout.write(f"{min(h)}\n{max(h)}\n{rises}\n")


main()
