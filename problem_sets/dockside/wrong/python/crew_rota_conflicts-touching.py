# Wrong on purpose: treats shifts that only touch (one ends at t, the other starts at t) as a
# clash.
import sys

data = sys.stdin.read().split()
n = int(data[0])
shifts = [(data[1 + 3 * i], int(data[2 + 3 * i]), int(data[3 + 3 * i])) for i in range(n)]
pairs = [f"{min(a, b)} {max(a, b)}" for i, (a, s1, e1) in enumerate(shifts)
         for (b, s2, e2) in shifts[i + 1:] if max(s1, s2) <= min(e1, e2)]
print("\n".join(pairs) if pairs else "NONE")
