import heapq
import sys


def main():
    data = sys.stdin.buffer.read().split()
    n = int(data[0])
    arrive = list(map(int, data[1:1 + 2 * n:2]))
    leave = list(map(int, data[2:2 + 2 * n:2]))
    berth = [0] * n
    in_use = []  # (time the berth frees, berth number)
    count = 0
    for i in sorted(range(n), key=arrive.__getitem__):
        if in_use and in_use[0][0] <= arrive[i]:
            _, b = heapq.heappop(in_use)  # the berth freed earliest is free again
        else:
            count += 1
            b = count
        berth[i] = b
        heapq.heappush(in_use, (leave[i], b))
    sys.stdout.write(f"{count}\n{' '.join(map(str, berth))}\n")


main()
