    my $step = $shift % 26;    # Perl's % takes the sign of the right operand: 0 to 25
    return $text =~ s{([a-zA-Z])}{
        my $base = ord($1) >= ord('a') ? ord('a') : ord('A');
        chr((ord($1) - $base + $step) % 26 + $base)
    }ger;
}
