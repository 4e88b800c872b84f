return array_map(static fn (bool $flag): bool => !$flag, $flags);
}
