import sys
from collections import deque


def main():
    data = sys.stdin.buffer.read().split()
    n, m = int(data[0]), int(data[1])
    after = [[] for _ in range(n + 1)]
    waiting_on = [0] * (n + 1)  # rules still blocking each crate
    for i in range(m):
        a, b = int(data[2 + 2 * i]), int(data[3 + 2 * i])
        after[a].append(b)
        waiting_on[b] += 1
    ready = deque(c for c in range(1, n + 1) if waiting_on[c] == 0)
    order = []
    while ready:
        c = ready.popleft()
        order.append(c)
        for d in after[c]:
            waiting_on[d] -= 1
            if waiting_on[d] == 0:
                ready.append(d)
    print(" ".join(map(str, order)) if len(order) == n else "STUCK")


main()
