import sys

data = sys.stdin.read().split()
n = int(data[0])
weights = [int(x) for x in data[1:1 + n]]
print(" ".join(str(i + 1) for i in sorted(range(n), key=lambda i: -weights[i])))
