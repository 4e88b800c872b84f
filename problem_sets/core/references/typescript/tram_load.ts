let onBoard = 0n;
let refused = 0n;
for (const [alighting, boarding] of stops) {
  onBoard -= alighting < onBoard ? alighting : onBoard;
  const room = capacity - onBoard;
  const taken = boarding < room ? boarding : room;
  onBoard += taken;
  refused += boarding - taken;
}
return [onBoard, refused];
}
