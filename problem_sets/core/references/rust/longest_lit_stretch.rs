let mut best = 0;
let mut run = 0;
for lit in states {
    run = if lit { run + 1 } else { 0 };
    best = best.max(run);
}
best
}
