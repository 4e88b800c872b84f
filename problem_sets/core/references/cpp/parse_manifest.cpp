auto trim = [](const std::string& s) {
    const size_t first = s.find_first_not_of(" \t");
    if (first == std::string::npos) {
        return std::string();
    }
    const size_t last = s.find_last_not_of(" \t");
    return s.substr(first, last - first + 1);
};
std::map<std::string, int64_t> totals;
std::istringstream lines(text);
std::string line;
while (std::getline(lines, line)) {
    if (trim(line).empty()) {
        continue;
    }
    const size_t colon = line.find(':');
    const std::string name = trim(line.substr(0, colon));
    const std::string quantity = trim(line.substr(colon + 1));
    totals[name] += std::stoll(quantity);
}
return totals;
}
