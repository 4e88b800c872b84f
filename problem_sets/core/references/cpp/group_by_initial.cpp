std::map<std::string, std::vector<std::string>> groups;
for (const auto& word : words) {
    if (word.empty()) {
        continue;
    }
    size_t length = 1;
    while (length < word.size() && (static_cast<unsigned char>(word[length]) & 0xC0) == 0x80) {
        ++length;
    }
    groups[word.substr(0, length)].push_back(word);
}
return groups;
}
