    my %counts;
    $counts{$_}++ for split //, $text;
    return \%counts;
}
