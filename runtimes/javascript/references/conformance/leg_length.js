return in_.includes(type) ? end - from : default_;
}
