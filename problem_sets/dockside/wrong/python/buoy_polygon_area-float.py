# Wrong on purpose: prints the area as a Python float, so a whole area comes out as "12.0".
# The exact checker compares text, so the value being right is not enough.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n = data[0]
xs, ys = data[1:1 + 2 * n:2], data[2:2 + 2 * n:2]
print(abs(sum(xs[i] * ys[(i + 1) % n] - xs[(i + 1) % n] * ys[i] for i in range(n))) / 2)
