#include <algorithm>
#include <iostream>
#include <string>
#include <vector>

int main() {
    int n;
    std::cin >> n;
    std::vector<std::string> name(n);
    std::vector<int> s(n), e(n);
    for (int i = 0; i < n; ++i) std::cin >> name[i] >> s[i] >> e[i];
    std::string out;
    for (int i = 0; i < n; ++i)
        for (int j = i + 1; j < n; ++j)
            if (std::max(s[i], s[j]) < std::min(e[i], e[j]))
                out += std::min(name[i], name[j]) + " " + std::max(name[i], name[j]) + "\n";
    std::cout << (out.empty() ? "NONE\n" : out);
}
