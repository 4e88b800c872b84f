return count(array_filter($names, static fn (string $name): bool => mb_strlen($name) >= $minLength));
}
