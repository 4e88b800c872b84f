# Slow on purpose (correct, quadratic): try every pair.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, target = data[0], data[1]
w = data[2:2 + n]
print(sum(1 for i in range(n) for j in range(i + 1, n) if w[i] + w[j] == target))
