    my %groups;
    for my $name (@$names) {
        next if $name eq '';
        push @{ $groups{ substr($name, 0, 1) } }, $name;
    }
    return \%groups;
}
