return array_map(static fn (float $offset): float => $offset * $factor, $offsets);
}
