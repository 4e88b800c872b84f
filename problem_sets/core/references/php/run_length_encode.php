// Each match is a maximal run: a character followed by more of the same (/u: code points).
preg_match_all('/(.)\1*/su', $text, $runs, PREG_SET_ORDER);
$code = '';
foreach ($runs as [$run, $char]) {
    $code .= mb_strlen($run) . $char;
}
return $code;
}
