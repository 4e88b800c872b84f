return array_count_values(mb_str_split($text));
}
