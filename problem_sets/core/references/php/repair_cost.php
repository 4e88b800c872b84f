// Levenshtein distance over code points (PHP's levenshtein() counts bytes), one row at a time.
$source = mb_str_split($a);
$target = mb_str_split($b);
$previous = range(0, count($target));
foreach ($source as $i => $charA) {
    $current = [$i + 1];
    foreach ($target as $j => $charB) {
        $current[] = min(
            $previous[$j + 1] + 1,
            $current[$j] + 1,
            $previous[$j] + ($charA === $charB ? 0 : 1),
        );
    }
    $previous = $current;
}
return $previous[count($target)];
}
