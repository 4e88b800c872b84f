# Wrong on purpose: the final stock list comes in the order the items first appeared, not
# sorted by name. The exact checker compares line by line, so the order matters.
import sys

lines = sys.stdin.read().split("\n")
stock = {}
for line in lines[1:1 + int(lines[0])]:
    parts = line.split()
    have = stock.get(parts[1], 0)
    if parts[0] == "IN":
        stock[parts[1]] = have + int(parts[2])
    elif parts[0] == "OUT":
        if have >= int(parts[2]):
            stock[parts[1]] = have - int(parts[2])
        else:
            print("SHORT", parts[1], have)
    else:
        print(parts[1], have)
print("END")
for item, s in stock.items():
    if s > 0:
        print(item, s)
