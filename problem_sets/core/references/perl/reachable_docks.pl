    my %seen = ($start => 1);
    my @stack = ($start);
    while (@stack) {
        my $dock = pop @stack;
        for my $next (@{ $adj->{$dock} // [] }) {
            push @stack, $next unless $seen{$next}++;
        }
    }
    # sort with no block compares strings by code point.
    return [sort keys %seen];
}
