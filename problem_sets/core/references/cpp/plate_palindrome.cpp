std::string kept;
for (char ch : plate) {
    const unsigned char byte = static_cast<unsigned char>(ch);
    if (byte < 0x80 && std::isalnum(byte)) {
        kept += static_cast<char>(std::tolower(byte));
    }
}
return std::equal(kept.begin(), kept.begin() + kept.size() / 2, kept.rbegin());
}
