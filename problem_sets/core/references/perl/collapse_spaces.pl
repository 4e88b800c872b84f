    return join ' ', grep { length } split /[ \t\n]+/, $text;
}
