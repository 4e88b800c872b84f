    my %totals;
    for my $line (split /\n/, $text) {
        next if $line =~ /\A[ \t]*\z/;
        my ($name, $quantity) = map { s/\A[ \t]+|[ \t]+\z//gr } split /:/, $line, 2;
        $totals{$name} += $quantity;
    }
    return \%totals;
}
