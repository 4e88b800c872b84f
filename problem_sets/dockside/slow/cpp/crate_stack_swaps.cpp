// Slow on purpose (correct, quadratic): count every out-of-order pair directly.
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> w(n);
    for (auto& x : w)
        if (std::scanf("%lld", &x) != 1) return 1;
    long long swaps = 0;
    for (int i = 0; i < n; ++i)
        for (int j = i + 1; j < n; ++j)
            if (w[i] > w[j]) ++swaps;
    std::printf("%lld\n", swaps);
}
