    if (name == null || name.isEmpty()) {
        return "Crate #" + number;
    }
    return name + " #" + number;
}
