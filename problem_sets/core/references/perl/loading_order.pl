    # Kahn's algorithm, always loading the smallest ready item; sort with no block compares
    # strings by code point.
    my (%waiting, %users);
    for my $item (keys %$deps) {
        $waiting{$item} //= 0;
        my %before = map { $_ => 1 } @{ $deps->{$item} };
        for my $other (keys %before) {
            $waiting{$other} //= 0;
            $waiting{$item}++;
            push @{ $users{$other} }, $item;
        }
    }
    my @ready = grep { $waiting{$_} == 0 } keys %waiting;
    my @order;
    while (@ready) {
        my ($item, @rest) = sort @ready;
        push @order, $item;
        @ready = (@rest, grep { --$waiting{$_} == 0 } @{ $users{$item} // [] });
    }
    return @order == keys %waiting ? \@order : undef;
}
