    return [] unless @$crew;
    my $r = $k % @$crew;
    return [@$crew[$r .. $#$crew], @$crew[0 .. $r - 1]];
}
