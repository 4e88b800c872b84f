    return scalar reverse $text;
}
