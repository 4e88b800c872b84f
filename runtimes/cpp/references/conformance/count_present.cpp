int64_t sum = 0;
int64_t missing = 0;
for (const auto& reading : readings) {
    if (reading) {
        sum += *reading;
    } else {
        ++missing;
    }
}
return {sum, missing};
}
