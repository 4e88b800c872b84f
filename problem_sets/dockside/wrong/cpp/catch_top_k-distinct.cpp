// Wrong on purpose: lists the k largest *distinct* weights, so equal catches are counted once.
#include <iostream>
#include <set>

int main() {
    int n, k;
    std::cin >> n >> k;
    std::set<long long> w;
    for (int i = 0; i < n; ++i) {
        long long x;
        std::cin >> x;
        w.insert(x);
    }
    int printed = 0;
    for (auto it = w.rbegin(); it != w.rend() && printed < k; ++it, ++printed) std::cout << *it << ' ';
    std::cout << '\n';
}
