#include <cstdio>
#include <vector>

int main() {
    long long n, q, c;
    if (std::scanf("%lld %lld %lld", &n, &q, &c) != 3) return 1;
    std::vector<long long> weights(n);
    for (auto &w : weights) std::scanf("%lld", &w);
    long long count = 0;
    for (long long i = 0; i < q; ++i) {
        long long left, right, total = 0;
        std::scanf("%lld %lld", &left, &right);
        for (long long j = left - 1; j < right; ++j) total += weights[j];
        if (total > c) ++count;
    }
    std::printf("%lld\n", count);
}
