return std::find(in.begin(), in.end(), type) != in.end() ? end - from : default_;
}
