# Slow on purpose (correct, quadratic): for every arrival time, count the boats moored then.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
boats = [(data[1 + 2 * i], data[2 + 2 * i]) for i in range(n)]
best, when = 0, 0
for t, _ in boats:
    count = sum(1 for a, b in boats if a <= t < b)
    if count > best or (count == best and t < when):
        best, when = count, t
print(best, when)
