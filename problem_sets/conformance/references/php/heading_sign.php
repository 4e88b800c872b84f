return -$heading;
}
