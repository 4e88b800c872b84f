    return $code =~ s/([0-9]+)([^0-9])/$2 x $1/gesr;
}
