# Wrong on purpose: the sample standard deviation (divide by n - 1) instead of the population
# one the statement asks for; a single reading is printed with spread 0.
import math
import sys

data = sys.stdin.buffer.read().split()
n = int(data[0])
xs = [float(x) for x in data[1:1 + n]]
mean = sum(xs) / n
var = sum((x - mean) ** 2 for x in xs) / (n - 1) if n > 1 else 0.0
print(f"{mean:.9f} {math.sqrt(var):.9f}")
