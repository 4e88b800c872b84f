std::unordered_set<std::string> seen;
for (const auto& code : tickets) {
    if (!seen.insert(code).second) {
        return code;
    }
}
return std::nullopt;
}
