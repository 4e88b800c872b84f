#include <cstdint>
#include <iostream>
#include <map>
#include <string>

int main() {
    std::ios::sync_with_stdio(false);
    std::cin.tie(nullptr);
    int q;
    std::cin >> q;
    std::map<std::string, int64_t> stock;  // ordered by name, byte by byte (ASCII)
    std::string out, command, item;
    for (int i = 0; i < q; ++i) {
        std::cin >> command >> item;
        int64_t& have = stock[item];
        if (command == "IN") {
            int64_t k;
            std::cin >> k;
            have += k;
        } else if (command == "OUT") {
            int64_t k;
            std::cin >> k;
            if (have >= k) have -= k;
            else out += "SHORT " + item + " " + std::to_string(have) + "\n";
        } else {
            out += item + " " + std::to_string(have) + "\n";
        }
    }
    out += "END\n";
    for (const auto& [name, s] : stock)
        if (s > 0) out += name + " " + std::to_string(s) + "\n";
    std::cout << out;
}
