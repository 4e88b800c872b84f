    my %parent = map { $_ => $_ } @$docks;
    my sub find ($dock) {
        while ($parent{$dock} ne $dock) {
            $parent{$dock} = $parent{ $parent{$dock} };
            $dock = $parent{$dock};
        }
        return $dock;
    }
    my $networks = @$docks;
    for my $link (@$links) {
        my ($root_a, $root_b) = (find($link->[0]), find($link->[1]));
        next if $root_a eq $root_b;
        $parent{$root_a} = $root_b;
        $networks--;
    }
    return $networks;
}
