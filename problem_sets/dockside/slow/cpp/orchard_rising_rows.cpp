// Slow on purpose (correct, quadratic): best[i] = longest rising selection ending at tree i.
#include <algorithm>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> h(n);
    for (auto& x : h)
        if (std::scanf("%lld", &x) != 1) return 1;
    std::vector<int> best(n, 1);
    for (int i = 0; i < n; ++i)
        for (int j = 0; j < i; ++j)
            if (h[j] < h[i] && best[j] + 1 > best[i]) best[i] = best[j] + 1;
    std::printf("%d\n", *std::max_element(best.begin(), best.end()));
}
