return implode(' ', array_reverse(preg_split('/ +/', $line, -1, PREG_SPLIT_NO_EMPTY)));
}
