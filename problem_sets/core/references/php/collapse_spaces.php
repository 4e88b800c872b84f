return implode(' ', preg_split('/[ \t\n]+/', $text, -1, PREG_SPLIT_NO_EMPTY));
}
