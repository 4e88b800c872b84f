    my %nodes = map { $_ => 1 } keys %$adj, map { @$_ } values %$adj;
    # $reach{$x}: every lighthouse $x reaches along one or more links.
    my %reach;
    for my $node (keys %nodes) {
        my %seen;
        my @stack = @{ $adj->{$node} // [] };
        while (@stack) {
            my $next = pop @stack;
            next if $seen{$next}++;
            push @stack, @{ $adj->{$next} // [] };
        }
        $reach{$node} = \%seen;
    }
    # A lighthouse that reaches itself lies on a loop: the members reach it and it reaches them.
    my %assigned;
    my $loops = 0;
    for my $node (keys %reach) {
        next if $assigned{$node} || !$reach{$node}{$node};
        $assigned{$_} = 1 for grep { $reach{$_}{$node} } keys %{ $reach{$node} };
        $loops++;
    }
    return $loops;
}
