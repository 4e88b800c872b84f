return array_values(array_intersect($first, $second));
}
