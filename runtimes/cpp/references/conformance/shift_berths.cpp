std::map<int64_t, std::string> shifted;
for (const auto& [berth, vessel] : owners) {
    shifted.emplace(berth + offset, vessel);
}
return shifted;
}
