#include <algorithm>
#include <cstdint>
#include <cstdio>
#include <vector>

static int64_t trips_needed(const std::vector<int64_t>& weights, int64_t capacity, int64_t give_up) {
    int64_t trips = 1, load = 0;
    for (int64_t w : weights) {
        if (load + w > capacity) {
            if (++trips > give_up) break;
            load = 0;
        }
        load += w;
    }
    return trips;
}

int main() {
    int n;
    int64_t d;
    if (std::scanf("%d %ld", &n, &d) != 2) return 1;
    std::vector<int64_t> weights(n);
    int64_t low = 0, high = 0;  // the answer lies in [max weight, total weight]
    for (auto& w : weights) {
        if (std::scanf("%ld", &w) != 1) return 1;
        low = std::max(low, w);
        high += w;
    }
    while (low < high) {
        int64_t mid = low + (high - low) / 2;
        if (trips_needed(weights, mid, d) <= d) high = mid;
        else low = mid + 1;
    }
    std::printf("%ld\n", low);
}
