    return flags.Select(flag => !flag).ToList();
}
