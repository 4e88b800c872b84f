    return 0 if $start eq $goal;
    # Breadth-first search: docks are settled in order of their number of trips.
    my %trips = ($start => 0);
    my @queue = ($start);
    while (@queue) {
        my $dock = shift @queue;
        for my $next (@{ $adj->{$dock} // [] }) {
            next if exists $trips{$next};
            $trips{$next} = $trips{$dock} + 1;
            return $trips{$next} if $next eq $goal;
            push @queue, $next;
        }
    }
    return undef;
}
