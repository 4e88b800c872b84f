import sys

OPENER = {")": "(", "]": "[", "}": "{", ">": "<"}


def main():
    manifest = sys.stdin.readline().strip()
    stack = []
    for position, c in enumerate(manifest, start=1):
        if c in OPENER:
            if not stack or stack[-1] != OPENER[c]:
                print(f"INVALID {position}")
                return
            stack.pop()
        else:
            stack.append(c)
    print("VALID" if not stack else f"INVALID {len(manifest) + 1}")


main()
