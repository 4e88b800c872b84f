#include <cstdint>
#include <cstdio>
#include <unordered_map>

int main() {
    int n;
    int64_t target;
    if (std::scanf("%d %ld", &n, &target) != 2) return 1;
    std::unordered_map<int64_t, int64_t> seen;
    seen.reserve(2 * n);
    int64_t pairs = 0;
    for (int i = 0; i < n; ++i) {
        int64_t w;
        if (std::scanf("%ld", &w) != 1) return 1;
        auto it = seen.find(target - w);  // earlier crates that complete this one
        if (it != seen.end()) pairs += it->second;
        ++seen[w];
    }
    std::printf("%ld\n", pairs);
}
