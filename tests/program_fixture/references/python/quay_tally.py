import sys

numbers = [int(x) for x in sys.stdin.read().split()]
weights = numbers[1:1 + numbers[0]]
print(sum(weights), max(weights))
