    return [] unless @$a_;
    my $columns = @{ $b_->[0] };
    my @product;
    for my $row (@$a_) {
        my @cells;
        for my $j (0 .. $columns - 1) {
            my $sum = 0;
            $sum += $row->[$_] * $b_->[$_][$j] for 0 .. $#$row;
            push @cells, $sum;
        }
        push @product, \@cells;
    }
    return \@product;
}
