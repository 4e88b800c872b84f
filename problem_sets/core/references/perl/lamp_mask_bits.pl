    # pack 'q' gives the 64-bit two's complement bytes; the %32b* checksum counts their 1 bits.
    return unpack '%32b*', pack 'q', $mask;
}
