// Wrong on purpose: prints a running tally line after every basket instead of one line per
// variety, so varieties with several baskets appear several times.
#include <iostream>
#include <map>
#include <string>
#include <utility>

int main() {
    int n;
    std::cin >> n;
    std::map<std::string, std::pair<long long, long long>> totals;
    for (int i = 0; i < n; ++i) {
        std::string name;
        long long kg;
        std::cin >> name >> kg;
        auto& e = totals[name];
        e.first += kg;
        e.second += 1;
        std::cout << name << ' ' << e.first << ' ' << e.second << '\n';
    }
}
