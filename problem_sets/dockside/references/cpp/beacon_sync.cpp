#include <cstdint>
#include <iostream>
#include <numeric>

int main() {
    int n;
    std::cin >> n;
    int64_t t = 1;
    for (int i = 0; i < n; ++i) {
        int64_t p;
        std::cin >> p;
        t = t / std::gcd(t, p) * p;
    }
    std::cout << t << '\n';
}
