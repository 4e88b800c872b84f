// The length in bytes of the UTF-8 sequence that starts with this byte.
auto sequence_length = [](unsigned char lead) -> size_t {
    if (lead >= 0xF0) return 4;
    if (lead >= 0xE0) return 3;
    if (lead >= 0xC0) return 2;
    return 1;
};
std::map<std::string, std::vector<std::string>> groups;
for (const auto& name : names) {
    if (name.empty()) {
        continue;
    }
    std::string initial = name.substr(0, sequence_length(static_cast<unsigned char>(name[0])));
    groups[initial].push_back(name);
}
return groups;
}
