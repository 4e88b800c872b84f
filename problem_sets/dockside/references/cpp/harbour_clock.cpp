#include <cstdio>

int main() {
    int t;
    if (std::scanf("%d", &t) != 1) return 1;
    for (int k = 0; k < t; ++k) {
        int hh, mm;
        long long d;
        if (std::scanf("%d:%d %lld", &hh, &mm, &d) != 3) return 1;
        long long end = hh * 60 + mm + d;
        long long days = end / 1440, minute = end % 1440;
        std::printf("%02lld:%02lld", minute / 60, minute % 60);
        if (days > 0) std::printf(" +%lld", days);
        std::printf("\n");
    }
}
