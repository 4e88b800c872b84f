return implode('', array_reverse(mb_str_split($text)));
}
