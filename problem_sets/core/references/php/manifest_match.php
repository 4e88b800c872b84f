$chars = mb_str_split($text);
$length = count($chars);
// matches[j]: the pattern read so far matches the first j characters of the text.
$matches = array_fill(0, $length + 1, false);
$matches[0] = true;
foreach (mb_str_split($pattern) as $p) {
    $next = array_fill(0, $length + 1, false);
    if ($p === '*') {
        $seen = false;
        for ($j = 0; $j <= $length; $j++) {
            $seen = $seen || $matches[$j];
            $next[$j] = $seen;
        }
    } else {
        for ($j = 1; $j <= $length; $j++) {
            $next[$j] = $matches[$j - 1] && ($p === '?' || $p === $chars[$j - 1]);
        }
    }
    $matches = $next;
}
return $matches[$length];
}
