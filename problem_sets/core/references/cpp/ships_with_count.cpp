// std::map iterates keys in bytewise order, which for UTF-8 is code point order.
std::vector<std::string> names;
for (const auto& [name, count] : tally) {
    if (count == target) {
        names.push_back(name);
    }
}
return names;
}
