#include <algorithm>
#include <cstdio>
#include <functional>
#include <numeric>
#include <queue>
#include <string>
#include <utility>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> arrive(n), leave(n);
    for (int i = 0; i < n; ++i)
        if (std::scanf("%lld %lld", &arrive[i], &leave[i]) != 2) return 1;
    std::vector<int> order(n);
    std::iota(order.begin(), order.end(), 0);
    std::sort(order.begin(), order.end(), [&](int x, int y) { return arrive[x] < arrive[y]; });
    using Item = std::pair<long long, int>;  // (time the berth frees, berth number)
    std::priority_queue<Item, std::vector<Item>, std::greater<Item>> in_use;
    std::vector<int> berth(n);
    int count = 0;
    for (int i : order) {
        int b;
        if (!in_use.empty() && in_use.top().first <= arrive[i]) {
            b = in_use.top().second;  // the berth freed earliest is free again
            in_use.pop();
        } else {
            b = ++count;
        }
        berth[i] = b;
        in_use.push({leave[i], b});
    }
    std::string out = std::to_string(count) + "\n";
    for (int i = 0; i < n; ++i) out += std::to_string(berth[i]) + (i + 1 < n ? " " : "\n");
    std::fputs(out.c_str(), stdout);
}
