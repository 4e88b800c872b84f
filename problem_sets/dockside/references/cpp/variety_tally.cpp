#include <iostream>
#include <string>
#include <unordered_map>
#include <utility>

int main() {
    std::ios::sync_with_stdio(false);
    std::cin.tie(nullptr);
    int n;
    std::cin >> n;
    std::unordered_map<std::string, std::pair<long long, long long>> totals;
    for (int i = 0; i < n; ++i) {
        std::string name;
        long long kg;
        std::cin >> name >> kg;
        auto& entry = totals[name];
        entry.first += kg;
        entry.second += 1;
    }
    for (const auto& [name, entry] : totals) std::cout << name << ' ' << entry.first << ' ' << entry.second << '\n';
}
