#include <cstdio>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    long long sx = 0, sy = 0, total = 0;
    for (int i = 0; i < n; ++i) {
        long long x, y, w;
        if (std::scanf("%lld %lld %lld", &x, &y, &w) != 3) return 1;
        sx += w * x;
        sy += w * y;
        total += w;
    }
    std::printf("%.9f %.9f\n", (double)sx / total, (double)sy / total);
}
