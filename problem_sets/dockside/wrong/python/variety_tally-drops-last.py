# Wrong on purpose: the tally is right but the line of the last variety seen is never printed.
# The unordered-lines checker ignores order, not a missing line.
import sys

data = sys.stdin.read().split()
totals = {}
for i in range(int(data[0])):
    t, b = totals.get(data[1 + 2 * i], (0, 0))
    totals[data[1 + 2 * i]] = (t + int(data[2 + 2 * i]), b + 1)
for name, (t, b) in list(totals.items())[:-1]:
    print(name, t, b)
