    return value;
}
