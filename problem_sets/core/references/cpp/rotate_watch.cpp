if (crew.empty()) {
    return {};
}
std::vector<std::string> rotated = crew;
std::rotate(rotated.begin(), rotated.begin() + static_cast<std::ptrdiff_t>(k % static_cast<int64_t>(crew.size())),
            rotated.end());
return rotated;
}
