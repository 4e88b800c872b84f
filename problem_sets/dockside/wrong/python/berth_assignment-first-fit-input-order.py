# Wrong on purpose: gives each ship, in input order rather than by arrival, the first berth
# that is free for its whole stay. The plan is valid but can use more berths than needed.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
berths = []  # stays already placed at each berth
plan = []
for i in range(n):
    a, b = data[1 + 2 * i], data[2 + 2 * i]
    for number, placed in enumerate(berths):
        if all(b <= x or y <= a for x, y in placed):
            placed.append((a, b))
            plan.append(number + 1)
            break
    else:
        berths.append([(a, b)])
        plan.append(len(berths))
print(len(berths))
print(*plan)
