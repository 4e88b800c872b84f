std::vector<bool> flipped;
flipped.reserve(flags.size());
for (bool flag : flags) {
    flipped.push_back(!flag);
}
return flipped;
}
