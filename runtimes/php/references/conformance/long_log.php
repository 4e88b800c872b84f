return [mb_strlen($entries, 'UTF-8'), array_sum($marks)];
}
