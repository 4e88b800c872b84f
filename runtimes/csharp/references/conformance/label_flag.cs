    return entry.Item1 + (entry.Item2 ? ":on" : ":off") + (suffix ?? "");
}
