#include <cstdio>
#include <vector>

int main() {
    int n, m, k;
    if (std::scanf("%d %d %d", &n, &m, &k) != 3) return 1;
    std::vector<int> change(n + 2, 0);  // coats added at a segment minus coats ending just before it
    for (int j = 0; j < m; ++j) {
        int l, r;
        if (std::scanf("%d %d", &l, &r) != 2) return 1;
        ++change[l];
        --change[r + 1];
    }
    int coats = 0, count = 0;
    for (int s = 1; s <= n; ++s) {
        coats += change[s];
        if (coats >= k) ++count;
    }
    std::printf("%d\n", count);
}
