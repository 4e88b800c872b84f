# Slow on purpose (correct, O(n*q)): walk the table from the start for every question.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
t, h = data[1:1 + 2 * n:2], data[2:2 + 2 * n:2]
q = data[1 + 2 * n]
for x in data[2 + 2 * n:2 + 2 * n + q]:
    i = 0
    while i + 1 < n and t[i + 1] <= x:
        i += 1
    if i == n - 1:
        print(f"{h[i]:.9f}")
    else:
        print(f"{h[i] + (h[i + 1] - h[i]) * (x - t[i]) / (t[i + 1] - t[i]):.9f}")
