$seen = [$start => true];
$reached = [$start];
$stack = [$start];
while ($stack !== []) {
    $dock = array_pop($stack);
    foreach ($adj[$dock] ?? [] as $next) {
        if (!isset($seen[$next])) {
            $seen[$next] = true;
            $reached[] = $next;
            $stack[] = $next;
        }
    }
}
// SORT_STRING compares bytes, and UTF-8 byte order is code point order.
sort($reached, SORT_STRING);
return $reached;
}
