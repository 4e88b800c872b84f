std::vector<double> scaled;
scaled.reserve(offsets.size());
for (const double offset : offsets) {
    scaled.push_back(offset * factor);
}
return scaled;
}
