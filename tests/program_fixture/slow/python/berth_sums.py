import sys

data = sys.stdin.buffer.read().split()
n, q, c = int(data[0]), int(data[1]), int(data[2])
weights = [int(x) for x in data[3:3 + n]]
at = 3 + n
count = 0
for _ in range(q):
    left, right = int(data[at]), int(data[at + 1])
    at += 2
    if sum(weights[left - 1:right]) > c:
        count += 1
print(count)
