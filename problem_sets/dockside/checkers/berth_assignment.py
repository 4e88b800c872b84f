"""Checker for berth_assignment: any plan with the fewest berths is accepted.

usage: python3 berth_assignment.py INPUT EXPECTED ACTUAL
Exit 0 accepts, 1 refuses, and the first line on stdout says why. Only the first number of the
expected output (the fewest berths, from the reference) is used. An actual plan must state that
number, give every ship a berth from 1 to k, and never put two ships with overlapping stays at
the same berth (a stay is [a, b), so one ship may leave at the time the next arrives). A problem
reading INPUT or EXPECTED (our own files) is a checker failure, exit 2.
"""
import re
import sys

NUMBER = re.compile(rb"[0-9]{1,7}")


def refuse(message):
    print(message[:200])
    sys.exit(1)


def main():
    input_path, expected_path, actual_path = sys.argv[1:4]
    try:
        data = open(input_path, "rb").read().split()
        n = int(data[0])
        stays = [(int(data[1 + 2 * i]), int(data[2 + 2 * i])) for i in range(n)]
        fewest = int(open(expected_path, "rb").read().split()[0])
    except (OSError, ValueError, IndexError) as error:
        print(f"checker could not read the input or the expected output: {error}")
        sys.exit(2)

    tokens = open(actual_path, "rb").read().split()
    if len(tokens) != n + 1:
        refuse(f"{len(tokens)} numbers printed, expected {n + 1} (k, then a berth for each of {n} ships)")
    for token in tokens:
        if not NUMBER.fullmatch(token):
            refuse(f"not a berth number: {token[:30]!r}")
    k = int(tokens[0])
    if k != fewest:
        refuse(f"plan uses {k} berths; the fewest possible is {fewest}")
    by_berth = {}
    for ship, token in enumerate(tokens[1:]):
        berth = int(token)
        if not 1 <= berth <= k:
            refuse(f"ship {ship + 1} is given berth {berth}, outside 1..{k}")
        by_berth.setdefault(berth, []).append(ship)
    for berth, ships in by_berth.items():
        ships.sort(key=lambda s: stays[s])
        for x, y in zip(ships, ships[1:]):
            if stays[y][0] < stays[x][1]:
                refuse(f"ships {x + 1} and {y + 1} overlap at berth {berth}")
    print(f"valid plan for {n} ships with {k} berths")
    sys.exit(0)


main()
