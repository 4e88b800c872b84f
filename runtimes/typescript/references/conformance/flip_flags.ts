return flags.map((flag) => !flag);
}
