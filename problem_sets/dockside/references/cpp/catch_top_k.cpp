#include <algorithm>
#include <functional>
#include <iostream>
#include <vector>

int main() {
    std::ios::sync_with_stdio(false);
    std::cin.tie(nullptr);
    int n, k;
    std::cin >> n >> k;
    std::vector<long long> w(n);
    for (auto& x : w) std::cin >> x;
    std::sort(w.begin(), w.end(), std::greater<long long>());
    for (int i = 0; i < k; ++i) std::cout << w[i] << (i + 1 < k ? ' ' : '\n');
}
