if (!name || name->empty()) {
    return "Crate #" + std::to_string(number);
}
return *name + " #" + std::to_string(number);
}
