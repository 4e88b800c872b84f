#include <cstdio>
#include <vector>

int main() {
    long long n, q, c;
    if (std::scanf("%lld %lld %lld", &n, &q, &c) != 3) return 1;
    std::vector<long long> prefix(n + 1, 0);
    for (long long i = 0; i < n; ++i) {
        long long w;
        std::scanf("%lld", &w);
        prefix[i + 1] = prefix[i] + w;
    }
    long long count = 0;
    for (long long i = 0; i < q; ++i) {
        long long left, right;
        std::scanf("%lld %lld", &left, &right);
        if (prefix[right] - prefix[left - 1] > c) ++count;
    }
    std::printf("%lld\n", count);
}
