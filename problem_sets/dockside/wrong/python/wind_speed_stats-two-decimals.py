# Wrong on purpose: the right mean and spread, printed with two decimals. 1.41 is 0.0042 away
# from sqrt(2), far outside the 1e-6 tolerance, so the float checker must refuse it.
import math
import sys

data = sys.stdin.buffer.read().split()
n = int(data[0])
xs = [float(x) for x in data[1:1 + n]]
mean = sum(xs) / n
print(f"{mean:.2f} {math.sqrt(sum((x - mean) ** 2 for x in xs) / n):.2f}")
