std::vector<int64_t> result(heights.size(), -1);
std::vector<size_t> waiting;
for (size_t i = 0; i < heights.size(); ++i) {
    while (!waiting.empty() && heights[waiting.back()] < heights[i]) {
        result[waiting.back()] = static_cast<int64_t>(i);
        waiting.pop_back();
    }
    waiting.push_back(i);
}
return result;
}
