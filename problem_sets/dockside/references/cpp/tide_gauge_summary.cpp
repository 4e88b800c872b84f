#include <algorithm>
#include <cstdint>
#include <iostream>
#include <vector>

int main() {
    std::ios::sync_with_stdio(false);
    std::cin.tie(nullptr);
    int n;
    std::cin >> n;
    std::vector<int64_t> h(n);
    for (auto& x : h) std::cin >> x;
    int64_t rises = 0;
    for (int i = 1; i < n; ++i)
        if (h[i] > h[i - 1]) ++rises;
    std::cout << *std::min_element(h.begin(), h.end()) << '\n'
              << *std::max_element(h.begin(), h.end()) << '\n'
              << rises << '\n';
}
