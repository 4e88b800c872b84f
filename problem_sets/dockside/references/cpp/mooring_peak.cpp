#include <algorithm>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> a(n), b(n);
    for (int i = 0; i < n; ++i)
        if (std::scanf("%lld %lld", &a[i], &b[i]) != 2) return 1;
    std::sort(a.begin(), a.end());
    std::sort(b.begin(), b.end());
    long long best = 0, when = 0, current = 0;
    size_t j = 0;
    for (long long t : a) {
        while (b[j] <= t) {  // a departure at t frees its mooring first
            --current;
            ++j;
        }
        ++current;
        if (current > best) {
            best = current;
            when = t;
        }
    }
    std::printf("%lld %lld\n", best, when);
}
