#include <algorithm>
#include <iostream>
#include <map>
#include <string>
#include <vector>

int main() {
    std::ios::sync_with_stdio(false);
    int n;
    std::cin >> n;
    std::map<std::string, std::vector<std::string>> groups;  // keyed by the sorted letters
    for (int i = 0; i < n; ++i) {
        std::string label;
        std::cin >> label;
        std::string key = label;
        std::sort(key.begin(), key.end());
        groups[key].push_back(label);
    }
    std::string out;
    for (auto& [key, labels] : groups) {
        if (labels.size() < 2) continue;
        std::sort(labels.begin(), labels.end());
        for (size_t i = 0; i < labels.size(); ++i) out += labels[i] + (i + 1 < labels.size() ? " " : "\n");
    }
    std::cout << (out.empty() ? "NONE\n" : out);
}
