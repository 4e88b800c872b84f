int64_t count = 0;
for (const auto& name : names) {
    int64_t length = 0;
    for (unsigned char byte : name) {
        if ((byte & 0xC0) != 0x80) {  // one non-continuation byte per code point
            ++length;
        }
    }
    if (length >= min_length) {
        ++count;
    }
}
return count;
}
