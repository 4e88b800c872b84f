import sys


def trips_needed(weights, capacity, give_up):
    trips, load = 1, 0
    for w in weights:
        if load + w > capacity:
            trips += 1
            if trips > give_up:
                break
            load = 0
        load += w
    return trips


def main():
    data = list(map(int, sys.stdin.buffer.read().split()))
    n, d = data[0], data[1]
    weights = data[2:2 + n]
    low, high = max(weights), sum(weights)  # the answer lies in [low, high]
    while low < high:
        mid = (low + high) // 2
        if trips_needed(weights, mid, d) <= d:
            high = mid
        else:
            low = mid + 1
    print(low)


main()
