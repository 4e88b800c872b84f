#include <algorithm>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> tails;  // tails[k]: smallest last height of a rising selection of k + 1 trees
    for (int i = 0; i < n; ++i) {
        long long h;
        if (std::scanf("%lld", &h) != 1) return 1;
        auto it = std::lower_bound(tails.begin(), tails.end(), h);
        if (it == tails.end()) tails.push_back(h);
        else *it = h;
    }
    std::printf("%zu\n", tails.size());
}
