std::vector<double> patched;
patched.reserve(readings.size());
for (const double reading : readings) {
    patched.push_back(std::isnan(reading) ? fill : reading);
}
return patched;
}
