    # Levenshtein distance over characters, one row at a time.
    my @source = split //, $a_;
    my @target = split //, $b_;
    my @previous = (0 .. @target);
    for my $i (0 .. $#source) {
        my @current = ($i + 1);
        for my $j (0 .. $#target) {
            my $replace = $previous[$j] + ($source[$i] eq $target[$j] ? 0 : 1);
            my $delete = $previous[$j + 1] + 1;
            my $insert = $current[$j] + 1;
            my $best = $replace < $delete ? $replace : $delete;
            push @current, $insert < $best ? $insert : $best;
        }
        @previous = @current;
    }
    return $previous[-1];
}
