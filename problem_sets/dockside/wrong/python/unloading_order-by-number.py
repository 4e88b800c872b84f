# Wrong on purpose: ignores the rules and unloads the crates in number order (and never says
# STUCK). The custom checker must find a broken rule.
import sys

data = sys.stdin.buffer.read().split()
print(" ".join(str(c) for c in range(1, int(data[0]) + 1)))
