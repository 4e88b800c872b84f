# A power of two has exactly one bit set, which clearing the lowest set bit removes.
n.positive? && (n & (n - 1)).zero?
end
