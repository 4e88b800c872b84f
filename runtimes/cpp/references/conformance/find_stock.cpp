auto found = stock.find(item);
if (found == stock.end()) {
    return std::nullopt;
}
return found->second;
}
