return offsets.map((offset) => offset * factor);
}
