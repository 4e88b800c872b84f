std::string initials;
bool word_start = true;
for (size_t i = 0; i < full_name.size();) {
    size_t end = i + 1;
    while (end < full_name.size() && (static_cast<unsigned char>(full_name[end]) & 0xC0) == 0x80) {
        ++end;
    }
    if (full_name[i] == ' ') {
        word_start = true;
    } else if (word_start) {
        std::string first = full_name.substr(i, end - i);
        if (first.size() == 1 && first[0] >= 'a' && first[0] <= 'z') {
            first[0] = static_cast<char>(first[0] - 'a' + 'A');
        }
        initials += first;
        word_start = false;
    }
    i = end;
}
return initials;
}
