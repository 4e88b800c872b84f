import sys


def main():
    data = sys.stdin.buffer.read().split()
    n = int(data[0])
    arrivals = sorted(map(int, data[1:1 + 2 * n:2]))
    departures = sorted(map(int, data[2:2 + 2 * n:2]))
    best, when, current, j = 0, 0, 0, 0
    for t in arrivals:
        while departures[j] <= t:  # a departure at t frees its mooring first
            current -= 1
            j += 1
        current += 1
        if current > best:
            best, when = current, t
    print(best, when)


main()
