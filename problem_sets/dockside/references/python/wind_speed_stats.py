import math
import sys


def main():
    data = sys.stdin.buffer.read().split()
    n = int(data[0])
    xs = [float(x) for x in data[1:1 + n]]
    mean = math.fsum(xs) / n
    var = math.fsum((x - mean) ** 2 for x in xs) / n
    print(f"{mean:.9f} {math.sqrt(var):.9f}")


main()
