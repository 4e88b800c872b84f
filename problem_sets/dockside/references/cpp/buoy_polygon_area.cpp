#include <cstdint>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<int64_t> x(n), y(n);
    for (int i = 0; i < n; ++i)
        if (std::scanf("%ld %ld", &x[i], &y[i]) != 2) return 1;
    // Shoelace formula: twice the signed area, in exact integers (at most 8e12 in size, and each
    // partial sum stays within 64 bits).
    int64_t twice = 0;
    for (int i = 0; i < n; ++i) {
        int j = (i + 1) % n;
        twice += x[i] * y[j] - x[j] * y[i];
    }
    if (twice < 0) twice = -twice;
    if (twice % 2) std::printf("%ld.5\n", twice / 2);
    else std::printf("%ld\n", twice / 2);
}
