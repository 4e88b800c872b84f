    return [map { $positions->[$_] - $positions->[$_ - 1] } 1 .. $#$positions];
}
