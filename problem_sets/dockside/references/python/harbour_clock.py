import sys


def main():
    data = sys.stdin.read().split()
    t = int(data[0])
    out = []
    for k in range(t):
        clock, duration = data[1 + 2 * k], int(data[2 + 2 * k])
        start = int(clock[:2]) * 60 + int(clock[3:5])
        end = start + duration
        days, minute = divmod(end, 1440)
        text = f"{minute // 60:02d}:{minute % 60:02d}"
        out.append(text + (f" +{days}" if days else ""))
    sys.stdout.write("\n".join(out) + "\n")


main()
