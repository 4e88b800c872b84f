    return join ' ', reverse grep { length } split / +/, $line;
}
