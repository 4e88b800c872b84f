    if (values.isEmpty()) {
        return null;
    }
    return new Pair<>(Collections.min(values), Collections.max(values));
}
