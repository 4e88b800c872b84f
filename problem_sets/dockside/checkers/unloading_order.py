"""Checker for unloading_order: any order that obeys every rule is accepted.

usage: python3 unloading_order.py INPUT EXPECTED ACTUAL
Exit 0 accepts, 1 refuses, and the first line on stdout says why. The expected output is the
reference's: it says only whether an order exists (STUCK or not). An actual order must name
every crate 1..n exactly once and put a before b for every rule `a b`. A problem reading INPUT
or EXPECTED (our own files) is a checker failure, exit 2.
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
        n, m = int(data[0]), int(data[1])
        rules = [(int(data[2 + 2 * i]), int(data[3 + 2 * i])) for i in range(m)]
        stuck = open(expected_path, "rb").read().split()[0] == b"STUCK"
    except (OSError, ValueError, IndexError) as error:
        print(f"checker could not read the input or the expected output: {error}")
        sys.exit(2)

    tokens = open(actual_path, "rb").read().split()
    if stuck:
        if tokens == [b"STUCK"]:
            print("correctly reported STUCK")
            sys.exit(0)
        refuse("the rules contain a cycle: the output must be the single word STUCK")
    if tokens == [b"STUCK"]:
        refuse("printed STUCK, but an order obeying every rule exists")
    if len(tokens) != n:
        refuse(f"{len(tokens)} crates listed, expected all {n}")
    place = [0] * (n + 1)
    for i, token in enumerate(tokens):
        if not NUMBER.fullmatch(token) or not 1 <= int(token) <= n:
            refuse(f"not a crate number from 1 to {n}: {token[:30]!r}")
        crate = int(token)
        if place[crate]:
            refuse(f"crate {crate} is listed twice")
        place[crate] = i + 1
    for a, b in rules:
        if place[a] > place[b]:
            refuse(f"crate {b} is unloaded before crate {a}, against the rule '{a} {b}'")
    print(f"all {n} crates in an order obeying all {m} rules")
    sys.exit(0)


main()
