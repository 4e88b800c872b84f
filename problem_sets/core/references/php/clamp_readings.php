return array_map(static function (int $value) use ($low, $high): int {
    if ($low !== null && $value < $low) {
        return $low;
    }
    if ($high !== null && $value > $high) {
        return $high;
    }
    return $value;
}, $values);
}
