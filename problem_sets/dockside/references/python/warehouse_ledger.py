import sys


def main():
    lines = sys.stdin.read().split("\n")
    q = int(lines[0])
    stock = {}
    out = []
    for line in lines[1:1 + q]:
        parts = line.split()
        command, item = parts[0], parts[1]
        have = stock.get(item, 0)
        if command == "IN":
            stock[item] = have + int(parts[2])
        elif command == "OUT":
            k = int(parts[2])
            if have >= k:
                stock[item] = have - k
            else:
                out.append(f"SHORT {item} {have}")
        else:
            out.append(f"{item} {have}")
    out.append("END")
    out.extend(f"{item} {s}" for item, s in sorted(stock.items()) if s > 0)
    sys.stdout.write("\n".join(out) + "\n")


main()
