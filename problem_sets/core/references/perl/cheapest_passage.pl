    return 0 if $start eq $goal;
    my %graph;
    for my $route (@$routes) {
        my ($one, $other, $cost) = @$route;
        push @{ $graph{$one} }, [$other, $cost];
        push @{ $graph{$other} }, [$one, $cost];
    }
    # Dijkstra's algorithm, picking the nearest unsettled island by a scan (core Perl has no
    # priority queue).
    my %best = ($start => 0);
    my %settled;
    while (1) {
        my $island;
        for my $name (keys %best) {
            next if $settled{$name};
            $island = $name if !defined $island || $best{$name} < $best{$island};
        }
        return undef unless defined $island;
        return $best{$island} if $island eq $goal;
        $settled{$island} = 1;
        for my $edge (@{ $graph{$island} // [] }) {
            my ($next, $cost) = @$edge;
            my $candidate = $best{$island} + $cost;
            $best{$next} = $candidate if !defined $best{$next} || $candidate < $best{$next};
        }
    }
}
