    return -heading;
}
