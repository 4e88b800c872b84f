import sys

data = sys.stdin.buffer.read().split()
n, q, c = int(data[0]), int(data[1]), int(data[2])
prefix = [0] * (n + 1)
for i in range(n):
    prefix[i + 1] = prefix[i] + int(data[3 + i])
at = 3 + n
count = 0
for _ in range(q):
    left, right = int(data[at]), int(data[at + 1])
    at += 2
    if prefix[right] - prefix[left - 1] >= c:
        count += 1
print(count)
