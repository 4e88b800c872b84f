// Slow on purpose (correct, quadratic): for every arrival time, count the boats moored then.
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> a(n), b(n);
    for (int i = 0; i < n; ++i)
        if (std::scanf("%lld %lld", &a[i], &b[i]) != 2) return 1;
    long long best = 0, when = 0;
    for (int i = 0; i < n; ++i) {
        long long t = a[i], count = 0;
        for (int j = 0; j < n; ++j)
            if (a[j] <= t && t < b[j]) ++count;
        if (count > best || (count == best && t < when)) {
            best = count;
            when = t;
        }
    }
    std::printf("%lld %lld\n", best, when);
}
