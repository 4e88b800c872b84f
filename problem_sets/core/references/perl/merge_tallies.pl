    my %merged = %$a_;
    $merged{$_} += $b_->{$_} for keys %$b_;
    return \%merged;
}
