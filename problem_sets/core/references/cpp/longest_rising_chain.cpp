// tails[k] is the smallest last value of a strictly rising chain of length k + 1.
std::vector<int64_t> tails;
for (int64_t value : values) {
    const auto slot = std::lower_bound(tails.begin(), tails.end(), value);
    if (slot == tails.end()) {
        tails.push_back(value);
    } else {
        *slot = value;
    }
}
return static_cast<int64_t>(tails.size());
}
