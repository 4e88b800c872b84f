    # The text is a character string (the source is `use utf8`), so length counts code points.
    my $sum = 0;
    $sum += $_ for @$marks;
    return [length $entries, $sum];
}
