import sys


def main():
    data = sys.stdin.buffer.read().split()
    r, c = int(data[0]), int(data[1])
    grid = [data[2 + i * c: 2 + (i + 1) * c] for i in range(r)]
    out = []
    for j in range(c):
        out.append(" ".join(grid[i][j].decode() for i in range(r - 1, -1, -1)))
    sys.stdout.write("\n".join(out) + "\n")


main()
