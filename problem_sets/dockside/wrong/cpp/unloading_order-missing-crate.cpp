// Wrong on purpose: a valid order except that the last crate is left out.
#include <cstdio>
#include <vector>

int main() {
    int n, m;
    if (std::scanf("%d %d", &n, &m) != 2) return 1;
    std::vector<std::vector<int>> after(n + 1);
    std::vector<int> waiting_on(n + 1, 0);
    for (int i = 0; i < m; ++i) {
        int a, b;
        if (std::scanf("%d %d", &a, &b) != 2) return 1;
        after[a].push_back(b);
        ++waiting_on[b];
    }
    std::vector<int> order;
    for (int c = 1; c <= n; ++c)
        if (waiting_on[c] == 0) order.push_back(c);
    for (size_t head = 0; head < order.size(); ++head)
        for (int d : after[order[head]])
            if (--waiting_on[d] == 0) order.push_back(d);
    if ((int)order.size() != n) {
        std::printf("STUCK\n");
        return 0;
    }
    for (int i = 0; i + 1 < n; ++i) std::printf("%d ", order[i]);
    std::printf("\n");
}
