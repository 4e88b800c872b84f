    # Drop first, then fold case: lc would turn some non-ASCII letters into ASCII ones.
    my $kept = lc($plate =~ s/[^A-Za-z0-9]//gr);
    return $kept eq reverse $kept;
}
