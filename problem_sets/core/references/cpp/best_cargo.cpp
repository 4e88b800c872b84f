std::vector<int64_t> best(static_cast<size_t>(capacity) + 1, 0);
for (size_t i = 0; i < weights.size(); ++i) {
    for (int64_t room = capacity; room >= weights[i]; --room) {
        best[room] = std::max(best[room], best[room - weights[i]] + values[i]);
    }
}
return best[capacity];
}
