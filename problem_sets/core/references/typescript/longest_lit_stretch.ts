let best = 0n;
let run = 0n;
for (const lit of states) {
  run = lit ? run + 1n : 0n;
  if (run > best) best = run;
}
return best;
}
