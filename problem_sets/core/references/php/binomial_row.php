// Pascal's triangle: only additions, so no intermediate value exceeds the row's entries.
$row = [1];
for ($i = 0; $i < $n; $i++) {
    $next = [1];
    for ($k = 1; $k < count($row); $k++) {
        $next[] = $row[$k - 1] + $row[$k];
    }
    $next[] = 1;
    $row = $next;
}
return $row;
}
