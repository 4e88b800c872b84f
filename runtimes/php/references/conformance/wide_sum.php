return array_sum($values);
}
