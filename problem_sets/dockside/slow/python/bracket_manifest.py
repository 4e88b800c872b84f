# Slow on purpose (correct, quadratic on deep nesting): for each closing bracket, walk left past
# the items already closed to find the nearest open one.
import sys

OPENER = {")": "(", "]": "[", "}": "{", ">": "<"}
manifest = sys.stdin.readline().strip()
closed = [False] * len(manifest)
for i, c in enumerate(manifest):
    if c in OPENER:
        j = i - 1
        while j >= 0 and closed[j]:
            j -= 1
        if j < 0 or manifest[j] != OPENER[c]:
            print(f"INVALID {i + 1}")
            sys.exit(0)
        closed[i] = closed[j] = True
print("VALID" if all(closed) else f"INVALID {len(manifest) + 1}")
