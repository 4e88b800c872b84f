    return @in.Contains(type) ? end - from : @default;
}
