// Slow on purpose (correct, O(n * h), quadratic when most trees are on the fence): gift
// wrapping. From the current corner, the next corner is the tree that has no tree to its right
// (the farthest one if several are in line).
#include <algorithm>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <utility>
#include <vector>

using Point = std::pair<int64_t, int64_t>;

static int64_t dist2(const Point& a, const Point& b) {
    return (a.first - b.first) * (a.first - b.first) + (a.second - b.second) * (a.second - b.second);
}

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<Point> pts(n);
    for (auto& p : pts)
        if (std::scanf("%ld %ld", &p.first, &p.second) != 2) return 1;
    std::sort(pts.begin(), pts.end());
    pts.erase(std::unique(pts.begin(), pts.end()), pts.end());
    double length = 0;
    if (pts.size() > 1) {
        Point start = pts[0], current = start;
        do {
            int best = -1;
            for (int i = 0; i < (int)pts.size(); ++i) {
                if (pts[i] == current) continue;
                if (best < 0) {
                    best = i;
                    continue;
                }
                const Point& b = pts[best];
                const Point& p = pts[i];
                int64_t c = (b.first - current.first) * (p.second - current.second) -
                            (b.second - current.second) * (p.first - current.first);
                if (c < 0 || (c == 0 && dist2(current, p) > dist2(current, b))) best = i;
            }
            length += std::sqrt((double)dist2(current, pts[best]));
            current = pts[best];
        } while (current != start);
    }
    std::printf("%.9f\n", length);
}
