std::map<std::string, int64_t> merged = a;
for (const auto& [ship, count] : b) {
    merged[ship] += count;
}
return merged;
}
