$columns = [];
foreach ($grid as $row) {
    foreach ($row as $index => $cell) {
        $columns[$index][] = $cell;
    }
}
return $columns;
}
