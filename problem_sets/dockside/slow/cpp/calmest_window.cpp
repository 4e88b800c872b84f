// Slow on purpose (correct, O(n*k)): take the maximum of every window afresh.
#include <cstdio>
#include <vector>

int main() {
    int n, k;
    if (std::scanf("%d %d", &n, &k) != 2) return 1;
    std::vector<long long> h(n);
    for (auto& x : h)
        if (std::scanf("%lld", &x) != 1) return 1;
    long long best = -1;
    int start = 0;
    for (int s = 0; s + k <= n; ++s) {
        long long top = h[s];
        for (int i = s + 1; i < s + k; ++i)
            if (h[i] > top) top = h[i];
        if (best < 0 || top < best) {
            best = top;
            start = s + 1;
        }
    }
    std::printf("%lld %d\n", best, start);
}
