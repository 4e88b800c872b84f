const free = new Set();
for (let berth = 1n; berth <= count; berth++) {
  if (!taken.has(berth)) free.add(berth);
}
return free;
}
