# Wrong on purpose: the right three numbers on one line. The exact checker compares lines, so
# this must fail although a token-wise comparison would accept it.
import sys

data = sys.stdin.buffer.read().split()
n = int(data[0])
h = list(map(int, data[1:1 + n]))
rises = sum(1 for i in range(1, n) if h[i] > h[i - 1])
print(min(h), max(h), rises)
