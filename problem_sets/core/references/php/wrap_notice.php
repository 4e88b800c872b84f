$lines = [];
$current = null;
foreach ($words as $word) {
    if ($current === null) {
        $current = $word;
    } elseif (mb_strlen($current) + 1 + mb_strlen($word) <= $width) {
        $current .= ' ' . $word;
    } else {
        $lines[] = $current;
        $current = $word;
    }
}
if ($current !== null) {
    $lines[] = $current;
}
return $lines;
}
