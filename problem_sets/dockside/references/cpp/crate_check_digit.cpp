#include <iostream>
#include <string>

int main() {
    std::ios::sync_with_stdio(false);
    std::cin.tie(nullptr);
    int t;
    std::cin >> t;
    std::string label, out;
    for (int k = 0; k < t; ++k) {
        std::cin >> label;
        bool digits = label.size() == 8;
        for (char c : label)
            if (c < '0' || c > '9') digits = false;
        if (!digits) {
            out += "MALFORMED\n";
            continue;
        }
        int s = 0;
        for (int i = 0; i < 7; ++i) s += (label[i] - '0') * (i % 2 == 0 ? 3 : 1);
        int d = (10 - s % 10) % 10;
        if (label[7] - '0' == d) out += "OK\n";
        else out += "BAD " + std::to_string(d) + "\n";
    }
    std::cout << out;
}
