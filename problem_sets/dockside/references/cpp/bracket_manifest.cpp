#include <iostream>
#include <string>

int main() {
    std::ios::sync_with_stdio(false);
    std::string manifest;
    std::cin >> manifest;
    std::string stack;
    for (size_t i = 0; i < manifest.size(); ++i) {
        char c = manifest[i];
        char opener = c == ')' ? '(' : c == ']' ? '[' : c == '}' ? '{' : c == '>' ? '<' : 0;
        if (!opener) {
            stack.push_back(c);
        } else if (stack.empty() || stack.back() != opener) {
            std::cout << "INVALID " << i + 1 << '\n';
            return 0;
        } else {
            stack.pop_back();
        }
    }
    if (stack.empty()) std::cout << "VALID\n";
    else std::cout << "INVALID " << manifest.size() + 1 << '\n';
}
