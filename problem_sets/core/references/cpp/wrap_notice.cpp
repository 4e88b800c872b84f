auto length_of = [](const std::string& text) {
    int64_t length = 0;
    for (unsigned char byte : text) {
        if ((byte & 0xC0) != 0x80) {
            ++length;
        }
    }
    return length;
};
std::vector<std::string> lines;
std::string current;
int64_t current_length = 0;
for (const auto& word : words) {
    const int64_t word_length = length_of(word);
    if (current.empty()) {
        current = word;
        current_length = word_length;
    } else if (current_length + 1 + word_length <= width) {
        current += " " + word;
        current_length += 1 + word_length;
    } else {
        lines.push_back(current);
        current = word;
        current_length = word_length;
    }
}
if (!current.empty()) {
    lines.push_back(current);
}
return lines;
}
