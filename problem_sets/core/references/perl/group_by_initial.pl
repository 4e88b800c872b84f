    my %groups;
    for my $word (@$words) {
        next if $word eq '';
        push @{ $groups{ substr($word, 0, 1) } }, $word;
    }
    return \%groups;
}
