# Slow on purpose (correct, quadratic): count every out-of-order pair directly.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
w = data[1:1 + n]
print(sum(1 for i in range(n) for j in range(i + 1, n) if w[i] > w[j]))
