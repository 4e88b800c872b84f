    # The strings are character strings, so length counts code points.
    my @lines;
    for my $word (@$words) {
        if (@lines && length($lines[-1]) + 1 + length($word) <= $width) {
            $lines[-1] .= " $word";
        } else {
            push @lines, $word;
        }
    }
    return \@lines;
}
