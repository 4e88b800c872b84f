$step = (($shift % 26) + 26) % 26;
$lower = 'abcdefghijklmnopqrstuvwxyz';
$upper = strtoupper($lower);
$rotate = static fn (string $letters): string => substr($letters, $step) . substr($letters, 0, $step);
// strtr() maps bytes; in UTF-8 the bytes of a non-ASCII character are never ASCII letters.
return strtr($text, $lower . $upper, $rotate($lower) . $rotate($upper));
}
