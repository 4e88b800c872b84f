    my @chars = split //, $text;
    # $matches[$j]: the pattern read so far matches the first $j characters of the text.
    my @matches = (1, (0) x @chars);
    for my $p (split //, $pattern) {
        my @next = (0) x (@chars + 1);
        if ($p eq '*') {
            my $seen = 0;
            for my $j (0 .. $#matches) {
                $seen ||= $matches[$j];
                $next[$j] = $seen;
            }
        } else {
            for my $j (1 .. @chars) {
                $next[$j] = $matches[$j - 1] && ($p eq '?' || $p eq $chars[$j - 1]) ? 1 : 0;
            }
        }
        @matches = @next;
    }
    return $matches[-1];
}
