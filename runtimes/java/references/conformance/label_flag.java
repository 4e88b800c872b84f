    String label = entry.first() + (entry.second() ? ":on" : ":off");
    return suffix != null ? label + suffix : label;
}
