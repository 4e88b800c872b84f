std::map<std::string, int64_t> lengths;
for (const auto& word : words) {
    int64_t count = 0;
    for (unsigned char byte : word) {
        if ((byte & 0xC0) != 0x80) {  // every code point has exactly one non-continuation byte
            ++count;
        }
    }
    lengths[word] = count;
}
return lengths;
}
