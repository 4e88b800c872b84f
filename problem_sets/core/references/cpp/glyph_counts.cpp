std::map<std::string, int64_t> counts;
for (size_t i = 0; i < text.size();) {
    size_t end = i + 1;
    while (end < text.size() && (static_cast<unsigned char>(text[end]) & 0xC0) == 0x80) {
        ++end;
    }
    ++counts[text.substr(i, end - i)];
    i = end;
}
return counts;
}
