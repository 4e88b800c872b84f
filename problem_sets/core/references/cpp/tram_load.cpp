int64_t on_board = 0;
int64_t refused = 0;
for (const auto& [alighting, boarding] : stops) {
    on_board -= std::min(alighting, on_board);
    const int64_t taken = std::min(capacity - on_board, boarding);
    on_board += taken;
    refused += boarding - taken;
}
return {on_board, refused};
}
