# Wrong on purpose: prices in binary floating point, rounded by the float formatter. Ten seniors
# and three bicycles cost 34.15, and 90% of that is 30.735 exactly, but the double this computes
# for it lies just below it, so this prints 30.73 where the fare is 30.74.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
for k in range(data[0]):
    a, c, s, b = data[1 + 4 * k: 5 + 4 * k]
    price = 4.50 * a + 2.25 * c + 3.10 * s + 1.05 * b
    if a + c + s >= 10:
        price *= 0.9
    print(f"{price:.2f}")
