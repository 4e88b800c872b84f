std::string out;
std::string current;
int64_t run = 0;
for (size_t i = 0; i < text.size();) {
    size_t end = i + 1;
    while (end < text.size() && (static_cast<unsigned char>(text[end]) & 0xC0) == 0x80) {
        ++end;
    }
    const std::string character = text.substr(i, end - i);
    if (character == current) {
        ++run;
    } else {
        if (run > 0) {
            out += std::to_string(run) + current;
        }
        current = character;
        run = 1;
    }
    i = end;
}
if (run > 0) {
    out += std::to_string(run) + current;
}
return out;
}
