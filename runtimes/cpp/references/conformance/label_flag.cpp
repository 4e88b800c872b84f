const auto& [name, enabled] = entry;
return name + (enabled ? ":on" : ":off") + suffix.value_or("");
}
