# Wrong on purpose: the right k weights, but from lightest to heaviest. The tokens checker
# ignores layout, not order, so this must fail whenever the k weights are not all equal.
import sys

data = list(map(int, sys.stdin.buffer.read().split()))
n, k = data[0], data[1]
print(*sorted(data[2:2 + n])[n - k:])
