    Map<String, Long> totals = new HashMap<>();
    for (String line : text.split("\n", -1)) {
        if (line.replace(" ", "").replace("\t", "").isEmpty()) {
            continue;
        }
        int colon = line.indexOf(':');
        String name = line.substring(0, colon).replaceAll("^[ \t]+|[ \t]+$", "");
        String quantity = line.substring(colon + 1).replaceAll("^[ \t]+|[ \t]+$", "");
        totals.merge(name, Long.parseLong(quantity), Long::sum);
    }
    return totals;
}
