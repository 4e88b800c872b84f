// Slow on purpose (correct, quadratic on deep nesting): for each closing bracket, walk left past
// the items already closed to find the nearest open one.
#include <iostream>
#include <string>
#include <vector>

int main() {
    std::string manifest;
    std::cin >> manifest;
    long n = manifest.size();
    std::vector<char> closed(n, 0);
    for (long i = 0; i < n; ++i) {
        char c = manifest[i];
        char opener = c == ')' ? '(' : c == ']' ? '[' : c == '}' ? '{' : c == '>' ? '<' : 0;
        if (!opener) continue;
        long j = i - 1;
        while (j >= 0 && closed[j]) --j;
        if (j < 0 || manifest[j] != opener) {
            std::cout << "INVALID " << i + 1 << '\n';
            return 0;
        }
        closed[i] = closed[j] = 1;
    }
    for (long i = 0; i < n; ++i)
        if (!closed[i]) {
            std::cout << "INVALID " << n + 1 << '\n';
            return 0;
        }
    std::cout << "VALID\n";
}
