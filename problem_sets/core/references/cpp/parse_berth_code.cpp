size_t split = 0;
while (split < code.size() && code[split] >= 'A' && code[split] <= 'Z') {
    ++split;
}
const std::string letters = code.substr(0, split);
const std::string digits = code.substr(split);
if (letters.empty() || digits.empty() || digits.size() > 18) {
    return std::nullopt;
}
int64_t number = 0;
for (char ch : digits) {
    if (ch < '0' || ch > '9') {
        return std::nullopt;
    }
    number = number * 10 + (ch - '0');
}
return std::make_tuple(letters, number);
}
