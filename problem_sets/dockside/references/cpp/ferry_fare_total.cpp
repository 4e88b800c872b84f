#include <cstdint>
#include <cstdio>

int main() {
    int t;
    if (std::scanf("%d", &t) != 1) return 1;
    for (int k = 0; k < t; ++k) {
        int64_t a, c, s, b;
        if (std::scanf("%ld %ld %ld %ld", &a, &c, &s, &b) != 4) return 1;
        int64_t pence = 450 * a + 225 * c + 310 * s + 105 * b;
        if (a + c + s >= 10) pence = (pence * 9 + 5) / 10;
        std::printf("%ld.%02ld\n", pence / 100, pence % 100);
    }
}
