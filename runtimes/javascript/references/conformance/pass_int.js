return value;
}
