// Code points are the bytes that do not continue a UTF-8 sequence (continuations are 10xxxxxx).
int64_t code_points = 0;
for (const char byte : entries) {
    if ((static_cast<unsigned char>(byte) & 0xC0) != 0x80) {
        ++code_points;
    }
}
return std::make_tuple(code_points, std::accumulate(marks.begin(), marks.end(), int64_t{0}));
}
