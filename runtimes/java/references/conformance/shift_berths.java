    Map<Long, String> shifted = new HashMap<>();
    for (Map.Entry<Long, String> entry : owners.entrySet()) {
        shifted.put(entry.getKey() + offset, entry.getValue());
    }
    return shifted;
}
