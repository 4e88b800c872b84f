"""Checker for ferry_route: any quickest journey is accepted.

usage: python3 ferry_route.py INPUT EXPECTED ACTUAL
Exit 0 accepts, 1 refuses, and the first line on stdout says why. The expected output is the
reference's: only its first number (the quickest time, or -1) is used. An actual journey must
start at 1, end at n, use a ferry line for every step, and take exactly that quickest time. A
problem reading INPUT or EXPECTED (our own files) is a checker failure, exit 2.
"""
import re
import sys

NUMBER = re.compile(rb"-?[0-9]{1,19}")


def refuse(message):
    print(message[:200])
    sys.exit(1)


def main():
    input_path, expected_path, actual_path = sys.argv[1:4]
    try:
        data = open(input_path, "rb").read().split()
        n, m = int(data[0]), int(data[1])
        quickest_line = {}
        for i in range(m):
            u, v, w = int(data[2 + 3 * i]), int(data[3 + 3 * i]), int(data[4 + 3 * i])
            key = (u, v) if u < v else (v, u)
            if w < quickest_line.get(key, w + 1):
                quickest_line[key] = w
        quickest = int(open(expected_path, "rb").read().split()[0])
    except (OSError, ValueError, IndexError) as error:
        print(f"checker could not read the input or the expected output: {error}")
        sys.exit(2)

    tokens = open(actual_path, "rb").read().split()
    if not tokens:
        refuse("empty output")
    if len(tokens) > n + 1:
        refuse(f"{len(tokens)} numbers printed; a quickest journey visits at most {n} harbours")
    for token in tokens:
        if not NUMBER.fullmatch(token):
            refuse(f"not an integer: {token[:30]!r}")
    numbers = [int(token) for token in tokens]
    if quickest == -1:
        if numbers == [-1]:
            print("correctly reported unreachable")
            sys.exit(0)
        refuse("harbour n cannot be reached: the output must be the single line -1")
    if numbers[0] != quickest:
        refuse(f"total time {numbers[0]}, the quickest journey takes {quickest}")
    route = numbers[1:]
    if not route:
        refuse("the route is missing")
    if route[0] != 1 or route[-1] != n:
        refuse(f"the route must start at 1 and end at {n}; it goes from {route[0]} to {route[-1]}")
    total = 0
    for a, b in zip(route, route[1:]):
        key = (a, b) if a < b else (b, a)
        if key not in quickest_line:
            refuse(f"no ferry line between harbours {a} and {b}")
        total += quickest_line[key]
    if total != quickest:
        refuse(f"the route takes {total} minutes, not the {quickest} printed")
    print(f"quickest journey of {quickest} minutes over {len(route) - 1} lines")
    sys.exit(0)


main()
