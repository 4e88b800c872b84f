int64_t best = 0;
int64_t run = 0;
for (bool lit : states) {
    run = lit ? run + 1 : 0;
    best = std::max(best, run);
}
return best;
}
