    return (grep { $_ eq $type } @$in) ? $end - $from : $default_;
}
