"""Large hidden cases for bracket_manifest.

usage: python3 bracket_manifest.py N SEED MODE INPUT_PATH OUTPUT_PATH
MODE deep: items nested N/2 deep, of random kinds, then closed (valid); mixed: a valid manifest
of random shape, as a random walk that opens or closes; deep-broken: like deep, with one
closing bracket of the wrong kind close to the end. Answers come from one pass with a stack
(O(n)); walking left past closed items instead is quadratic on deep nesting.
"""
import random
import sys

OPEN, CLOSE = "([{<", ")]}>"
OPENER = {")": "(", "]": "[", "}": "{", ">": "<"}


def solve(manifest):
    stack = []
    for position, c in enumerate(manifest, start=1):
        if c in OPENER:
            if not stack or stack[-1] != OPENER[c]:
                return f"INVALID {position}\n"
            stack.pop()
        else:
            stack.append(c)
    return "VALID\n" if not stack else f"INVALID {len(manifest) + 1}\n"


def main():
    n, seed, mode, input_path, output_path = sys.argv[1:]
    n, rng = int(n), random.Random(int(seed))
    if mode in ("deep", "deep-broken"):
        kinds = [rng.randrange(4) for _ in range(n // 2)]
        text = [OPEN[k] for k in kinds] + [CLOSE[k] for k in reversed(kinds)]
        if mode == "deep-broken":
            spot = n - 1 - rng.randrange(100)
            text[spot] = CLOSE[(CLOSE.index(text[spot]) + 1) % 4]
    else:
        text, stack = [], []
        while len(text) + len(stack) < n:
            if stack and (rng.random() < 0.45 or len(text) + len(stack) + 2 > n):
                text.append(CLOSE[stack.pop()])
            else:
                k = rng.randrange(4)
                stack.append(k)
                text.append(OPEN[k])
        text += [CLOSE[k] for k in reversed(stack)]
    manifest = "".join(text)
    with open(input_path, "w") as f:
        f.write(manifest + "\n")
    with open(output_path, "w") as f:
        f.write(solve(manifest))


main()
