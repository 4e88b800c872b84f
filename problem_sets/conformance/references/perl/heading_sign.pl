    return -$heading;
}
