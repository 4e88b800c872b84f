    return [] unless @$grid;
    my $width = @{ $grid->[0] };
    return [map { my $i = $_; [map { $_->[$i] } @$grid] } 0 .. $width - 1];
}
