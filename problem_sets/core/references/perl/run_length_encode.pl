    # Each match is a maximal run: a character followed by more of the same.
    return $text =~ s/((.)\2*)/length($1) . $2/gesr;
}
