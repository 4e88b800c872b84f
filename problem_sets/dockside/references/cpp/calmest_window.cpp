#include <cstdio>
#include <deque>
#include <vector>

int main() {
    int n, k;
    if (std::scanf("%d %d", &n, &k) != 2) return 1;
    std::vector<long long> h(n);
    for (auto& x : h)
        if (std::scanf("%lld", &x) != 1) return 1;
    std::deque<int> window;  // indices whose heights decrease from front to back; front = window maximum
    long long best = -1;
    int start = 0;
    for (int i = 0; i < n; ++i) {
        while (!window.empty() && h[window.back()] <= h[i]) window.pop_back();
        window.push_back(i);
        if (window.front() <= i - k) window.pop_front();
        if (i >= k - 1 && (best < 0 || h[window.front()] < best)) {
            best = h[window.front()];
            start = i - k + 2;
        }
    }
    std::printf("%lld %d\n", best, start);
}
