    # A stack of the lighthouses still waiting for a taller one, heights non-increasing upward.
    my @result = (-1) x @$heights;
    my @waiting;
    for my $i (0 .. $#$heights) {
        while (@waiting && $heights->[ $waiting[-1] ] < $heights->[$i]) {
            $result[ pop @waiting ] = $i;
        }
        push @waiting, $i;
    }
    return \@result;
}
