// Slow on purpose (correct, O(n * (answer - lower bound))): try every capacity upward from a
// lower bound until one is enough.
#include <algorithm>
#include <cstdint>
#include <cstdio>
#include <vector>

int main() {
    int n;
    int64_t d;
    if (std::scanf("%d %ld", &n, &d) != 2) return 1;
    std::vector<int64_t> weights(n);
    int64_t top = 0, total = 0;
    for (auto& w : weights) {
        if (std::scanf("%ld", &w) != 1) return 1;
        top = std::max(top, w);
        total += w;
    }
    int64_t capacity = std::max(top, (total + d - 1) / d);
    while (true) {
        int64_t trips = 1, load = 0;
        for (int64_t w : weights) {
            if (load + w > capacity) {
                ++trips;
                load = 0;
            }
            load += w;
        }
        if (trips <= d) break;
        ++capacity;
    }
    std::printf("%ld\n", capacity);
}
