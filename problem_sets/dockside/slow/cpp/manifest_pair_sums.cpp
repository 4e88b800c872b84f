// Slow on purpose (correct, quadratic): try every pair.
#include <cstdint>
#include <cstdio>
#include <vector>

int main() {
    int n;
    int64_t target;
    if (std::scanf("%d %ld", &n, &target) != 2) return 1;
    std::vector<int64_t> w(n);
    for (auto& x : w)
        if (std::scanf("%ld", &x) != 1) return 1;
    int64_t pairs = 0;
    for (int i = 0; i < n; ++i)
        for (int j = i + 1; j < n; ++j)
            if (w[i] + w[j] == target) ++pairs;
    std::printf("%ld\n", pairs);
}
