    my %occupied = map { $_ => 1 } @$taken;
    return [grep { !$occupied{$_} } 1 .. $count];
}
