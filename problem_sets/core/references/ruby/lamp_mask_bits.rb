# Ruby's & treats negative numbers as infinite two's complement; keep the low 64 bits.
(mask & ((1 << 64) - 1)).to_s(2).count("1")
end
