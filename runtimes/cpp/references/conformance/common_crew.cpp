std::set<std::string> both;
for (const auto& name : first) {
    if (second.count(name) != 0) {
        both.insert(name);
    }
}
return both;
}
