    return in.contains(type) ? end - from : default_;
}
