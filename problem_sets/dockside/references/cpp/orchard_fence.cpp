#include <algorithm>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <utility>
#include <vector>

using Point = std::pair<int64_t, int64_t>;

static int64_t cross(const Point& o, const Point& a, const Point& b) {
    return (a.first - o.first) * (b.second - o.second) - (a.second - o.second) * (b.first - o.first);
}

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<Point> pts(n);
    for (auto& p : pts)
        if (std::scanf("%ld %ld", &p.first, &p.second) != 2) return 1;
    std::sort(pts.begin(), pts.end());
    pts.erase(std::unique(pts.begin(), pts.end()), pts.end());
    if (pts.size() == 1) {
        std::printf("%.9f\n", 0.0);
        return 0;
    }
    // Andrew's monotone chain: lower hull left to right, then upper hull right to left.
    std::vector<Point> hull;
    for (int pass = 0; pass < 2; ++pass) {
        size_t start = hull.size();
        for (size_t k = 0; k < pts.size(); ++k) {
            const Point& p = pass == 0 ? pts[k] : pts[pts.size() - 1 - k];
            while (hull.size() >= start + 2 && cross(hull[hull.size() - 2], hull.back(), p) <= 0) hull.pop_back();
            hull.push_back(p);
        }
        hull.pop_back();  // the last point starts the other half
    }
    double length = 0;
    for (size_t i = 0; i < hull.size(); ++i) {
        const Point& a = hull[i];
        const Point& b = hull[(i + 1) % hull.size()];
        length += std::hypot((double)(a.first - b.first), (double)(a.second - b.second));
    }
    std::printf("%.9f\n", length);
}
