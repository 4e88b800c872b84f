    # The decimal text of the integer holds the digits of its absolute value, even for the
    # most negative one.
    my $total = 0;
    $total += $_ for "$n" =~ /[0-9]/g;
    return $total;
}
