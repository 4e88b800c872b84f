    my %on_second = map { $_ => 1 } @$second;
    return [grep { $on_second{$_} } @$first];
}
