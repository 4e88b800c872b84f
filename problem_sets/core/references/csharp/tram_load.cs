    long onBoard = 0;
    long refused = 0;
    foreach (var stop in stops)
    {
        var (alighting, boarding) = stop;
        onBoard -= Math.Min(alighting, onBoard);
        long taken = Math.Min(boarding, capacity - onBoard);
        onBoard += taken;
        refused += boarding - taken;
    }
    return (onBoard, refused);
}
