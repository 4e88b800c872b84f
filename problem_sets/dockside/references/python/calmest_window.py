import sys
from collections import deque


def main():
    data = sys.stdin.buffer.read().split()
    n, k = int(data[0]), int(data[1])
    h = list(map(int, data[2:2 + n]))
    window = deque()  # indices whose heights decrease from front to back; front = window maximum
    best, start = None, 0
    for i, x in enumerate(h):
        while window and h[window[-1]] <= x:
            window.pop()
        window.append(i)
        if window[0] <= i - k:
            window.popleft()
        if i >= k - 1:
            top = h[window[0]]
            if best is None or top < best:
                best, start = top, i - k + 2
    print(best, start)


main()
