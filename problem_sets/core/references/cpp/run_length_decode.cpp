std::string out;
size_t count = 0;
for (size_t i = 0; i < code.size();) {
    if (code[i] >= '0' && code[i] <= '9') {
        count = count * 10 + static_cast<size_t>(code[i] - '0');
        ++i;
        continue;
    }
    size_t end = i + 1;  // the character may take several UTF-8 bytes
    while (end < code.size() && (static_cast<unsigned char>(code[end]) & 0xC0) == 0x80) {
        ++end;
    }
    const std::string character = code.substr(i, end - i);
    for (size_t n = 0; n < count; ++n) {
        out += character;
    }
    count = 0;
    i = end;
}
return out;
}
