// decbin() writes a negative int as its 64-bit two's complement pattern.
return substr_count(decbin($mask), '1');
}
