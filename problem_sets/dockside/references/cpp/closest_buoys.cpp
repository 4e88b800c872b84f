#include <algorithm>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <vector>

struct Point {
    int64_t x, y;
};

static std::vector<Point> pts, scratch;

static int64_t square(int64_t v) { return v * v; }

// Smallest squared distance in pts[lo, hi) (sorted by x); leaves that range sorted by y.
static int64_t closest(int lo, int hi) {
    if (hi - lo <= 3) {
        int64_t best = INT64_MAX;
        for (int i = lo; i < hi; ++i)
            for (int j = i + 1; j < hi; ++j)
                best = std::min(best, square(pts[i].x - pts[j].x) + square(pts[i].y - pts[j].y));
        std::sort(pts.begin() + lo, pts.begin() + hi, [](const Point& a, const Point& b) { return a.y < b.y; });
        return best;
    }
    int mid = (lo + hi) / 2;
    int64_t split_x = pts[mid].x;
    int64_t best = std::min(closest(lo, mid), closest(mid, hi));
    std::merge(pts.begin() + lo, pts.begin() + mid, pts.begin() + mid, pts.begin() + hi, scratch.begin(),
               [](const Point& a, const Point& b) { return a.y < b.y; });
    std::copy(scratch.begin(), scratch.begin() + (hi - lo), pts.begin() + lo);
    int size = 0;
    for (int i = lo; i < hi; ++i)
        if (square(pts[i].x - split_x) < best) scratch[size++] = pts[i];
    for (int i = 0; i < size; ++i)
        for (int j = i + 1; j < size && square(scratch[j].y - scratch[i].y) < best; ++j)
            best = std::min(best, square(scratch[j].x - scratch[i].x) + square(scratch[j].y - scratch[i].y));
    return best;
}

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    pts.resize(n);
    scratch.resize(n);
    for (auto& p : pts)
        if (std::scanf("%ld %ld", &p.x, &p.y) != 2) return 1;
    std::sort(pts.begin(), pts.end(), [](const Point& a, const Point& b) { return a.x < b.x; });
    std::printf("%.9f\n", std::sqrt((double)closest(0, n)));
}
