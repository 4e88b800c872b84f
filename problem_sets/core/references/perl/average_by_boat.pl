    my (%sum, %count);
    for my $catch (@$catches) {
        my ($boat, $weight) = @$catch;
        $sum{$boat} += $weight;
        $count{$boat}++;
    }
    return { map { $_ => $sum{$_} / $count{$_} } keys %sum };
}
