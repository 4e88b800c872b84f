import math
import sys


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n = data[0]
    east = math.fsum(math.sin(math.radians(b)) for b in data[1:1 + n])
    north = math.fsum(math.cos(math.radians(b)) for b in data[1:1 + n])
    if math.hypot(east, north) < 1e-6:
        print("VARIABLE")
        return
    print(f"{math.degrees(math.atan2(east, north)) % 360:.9f}")


main()
