# Wrong on purpose: the plain arithmetic mean of the bearings (185 for 350 and 20, where the
# wind is from the north-north-east); it never reports VARIABLE either.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
print(f"{sum(data[1:1 + data[0]]) / data[0]:.9f}")
