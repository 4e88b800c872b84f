// Split into UTF-8 sequences (a lead byte plus its continuation bytes), then reverse those.
std::vector<std::string> characters;
for (size_t i = 0; i < text.size();) {
    size_t end = i + 1;
    while (end < text.size() && (static_cast<unsigned char>(text[end]) & 0xC0) == 0x80) {
        ++end;
    }
    characters.push_back(text.substr(i, end - i));
    i = end;
}
std::string reversed;
reversed.reserve(text.size());
for (auto it = characters.rbegin(); it != characters.rend(); ++it) {
    reversed += *it;
}
return reversed;
}
