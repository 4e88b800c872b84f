# Wrong on purpose: lists each group's labels in input order instead of sorted. The
# unordered-lines checker lets the lines come in any order, but each line must be exact.
import sys

data = sys.stdin.read().split()
groups = {}
for label in data[1:1 + int(data[0])]:
    groups.setdefault("".join(sorted(label)), []).append(label)
lines = [" ".join(g) for g in groups.values() if len(g) >= 2]
print("\n".join(lines) if lines else "NONE")
