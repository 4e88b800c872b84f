# Wrong on purpose: reports the error position counting from 0 instead of 1.
import sys

OPENER = {")": "(", "]": "[", "}": "{", ">": "<"}
manifest = sys.stdin.readline().strip()
stack = []
for position, c in enumerate(manifest):
    if c in OPENER:
        if not stack or stack[-1] != OPENER[c]:
            print(f"INVALID {position}")
            sys.exit(0)
        stack.pop()
    else:
        stack.append(c)
print("VALID" if not stack else f"INVALID {len(manifest)}")
