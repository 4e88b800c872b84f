return -heading;
}
