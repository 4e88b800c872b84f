#include <algorithm>
#include <cstdio>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    long long total = 0, heaviest = 0;
    for (int i = 0; i < n; ++i) {
        long long w;
        std::scanf("%lld", &w);
        total += w;
        heaviest = std::max(heaviest, w);
    }
    std::printf("%lld %lld\n", total, heaviest);
}
