#include <cstdio>
#include <vector>

int main() {
    int n, q;
    long long c;
    if (std::scanf("%d %d %lld", &n, &q, &c) != 3) return 1;
    std::vector<int> prefix(n + 1, 0);
    for (int i = 0; i < n; ++i) {
        int w;
        std::scanf("%d", &w);
        prefix[i + 1] = prefix[i] + w;
    }
    int count = 0;
    for (int i = 0; i < q; ++i) {
        int left, right;
        std::scanf("%d %d", &left, &right);
        if (prefix[right] - prefix[left - 1] > c) ++count;
    }
    std::printf("%d\n", count);
}
