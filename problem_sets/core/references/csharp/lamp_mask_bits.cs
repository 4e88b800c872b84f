    // The same 64 bits read as unsigned.
    ulong bits = (ulong)mask;
    long count = 0;
    while (bits != 0)
    {
        bits &= bits - 1;
        count++;
    }
    return count;
}
