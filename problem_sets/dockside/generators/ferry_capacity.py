"""Large hidden cases for ferry_capacity.

usage: python3 ferry_capacity.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE few-trips: d about 20; many-trips: d about n/3. In both the answer lies far above the
lower bound max(max w, ceil(sum w / d)), so trying capacities one by one is hopeless. The answer
is found by binary search on the capacity with a greedy count of trips (O(n log(sum w))).
"""
import random
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


def solve(weights, d):
    low, high = max(weights), sum(weights)
    while low < high:
        mid = (low + high) // 2
        if trips_needed(weights, mid, d) <= d:
            high = mid
        else:
            low = mid + 1
    return low


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    if mode == "few-trips":
        d = rng.randint(15, 25)
        weights = [rng.randint(1, 1000000000) for _ in range(n)]
    else:
        d = n // 3 + rng.randint(0, 100)
        weights = [rng.randint(1, 1000000000) for _ in range(n)]
    with open(input_path, "w") as f:
        f.write(f"{n} {d}\n{' '.join(map(str, weights))}\n")
    with open(output_path, "w") as f:
        f.write(f"{solve(weights, d)}\n")


main()
