    use integer;
    my @waits;
    my $departure = $interval;
    my $i = 0;
    while ($i < @$arrivals) {
        if ($arrivals->[$i] > $departure) {
            # Nobody is waiting: skip to the first departure at or after the next arrival.
            $departure = ($arrivals->[$i] + $interval - 1) / $interval * $interval;
        }
        my $boarded = 0;
        while ($i < @$arrivals && $boarded < $capacity && $arrivals->[$i] <= $departure) {
            push @waits, $departure - $arrivals->[$i];
            $boarded++;
            $i++;
        }
        $departure += $interval;
    }
    return \@waits;
}
