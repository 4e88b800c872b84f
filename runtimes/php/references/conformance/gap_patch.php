return array_map(static fn (float $reading): float => is_nan($reading) ? $fill : $reading, $readings);
}
