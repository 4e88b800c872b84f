    my %seen;
    for my $code (@$tickets) {
        return $code if $seen{$code}++;
    }
    return undef;
}
