    my $product = Math::BigInt->new(1);
    $product *= $_ for @$serials;
    return $product;
}
