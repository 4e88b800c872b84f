    return { map { $_ => length $_ } @$words };
}
