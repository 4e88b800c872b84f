    # $best[$r]: the largest worth of a load weighing at most $r, using the crates seen so far.
    my @best = (0) x ($capacity + 1);
    for my $i (0 .. $#$weights) {
        my ($weight, $value) = ($weights->[$i], $values->[$i]);
        for my $room (reverse $weight .. $capacity) {
            my $loaded = $best[$room - $weight] + $value;
            $best[$room] = $loaded if $loaded > $best[$room];
        }
    }
    return $best[$capacity];
}
