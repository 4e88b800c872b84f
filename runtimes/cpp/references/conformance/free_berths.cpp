std::set<int64_t> vacant;
for (int64_t berth = 1; berth <= count; ++berth) {
    if (taken.count(berth) == 0) {
        vacant.insert(berth);
    }
}
return vacant;
}
