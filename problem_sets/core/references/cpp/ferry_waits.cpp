std::vector<int64_t> waits;
int64_t departure = interval;
size_t next = 0;
while (next < arrivals.size()) {
    if (arrivals[next] > departure) {
        departure = (arrivals[next] + interval - 1) / interval * interval;
    }
    int64_t boarded = 0;
    while (next < arrivals.size() && boarded < capacity && arrivals[next] <= departure) {
        waits.push_back(departure - arrivals[next]);
        ++boarded;
        ++next;
    }
    departure += interval;
}
return waits;
}
