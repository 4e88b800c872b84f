    my %merged = %$a;
    $merged{$_} += $b->{$_} for keys %$b;
    return \%merged;
}
