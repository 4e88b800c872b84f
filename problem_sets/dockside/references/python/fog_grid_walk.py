import sys
from collections import deque


def main():
    lines = sys.stdin.read().split()
    r, c = int(lines[0]), int(lines[1])
    grid = lines[2:2 + r]
    for i, row in enumerate(grid):
        if "S" in row:
            start = (i, row.index("S"))
    steps = {start: 0}
    queue = deque([start])
    while queue:
        i, j = queue.popleft()
        if grid[i][j] == "T":
            print(steps[(i, j)])
            return
        for ni, nj in ((i - 1, j), (i + 1, j), (i, j - 1), (i, j + 1)):
            if 0 <= ni < r and 0 <= nj < c and grid[ni][nj] != "#" and (ni, nj) not in steps:
                steps[(ni, nj)] = steps[(i, j)] + 1
                queue.append((ni, nj))
    print(-1)


main()
