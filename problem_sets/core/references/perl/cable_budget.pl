    # Kruskal's algorithm: take the cheapest cables that join two separate networks.
    my %parent = map { $_ => $_ } @$docks;
    my sub find ($dock) {
        while ($parent{$dock} ne $dock) {
            $parent{$dock} = $parent{ $parent{$dock} };
            $dock = $parent{$dock};
        }
        return $dock;
    }
    my ($total, $joined) = (0, 0);
    for my $cable (sort { $a->[2] <=> $b->[2] } @$cables) {
        my ($root_a, $root_b) = (find($cable->[0]), find($cable->[1]));
        next if $root_a eq $root_b;
        $parent{$root_a} = $root_b;
        $total += $cable->[2];
        $joined++;
    }
    return @$docks <= 1 || $joined == @$docks - 1 ? $total : undef;
}
