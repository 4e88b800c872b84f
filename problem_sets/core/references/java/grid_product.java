    List<List<Long>> product = new ArrayList<>();
    for (List<Long> row : a) {
        List<Long> out = new ArrayList<>();
        for (int j = 0; j < b.get(0).size(); j++) {
            long sum = 0;
            for (int t = 0; t < row.size(); t++) {
                sum += row.get(t) * b.get(t).get(j);
            }
            out.add(sum);
        }
        product.add(out);
    }
    return product;
}
