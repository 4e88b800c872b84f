    # tr changes only ASCII a-z; uc would also change letters beyond ASCII.
    return join '', map { (substr $_, 0, 1) =~ tr/a-z/A-Z/r } split / /, $full_name;
}
