$total = 0;
$missing = 0;
foreach ($readings as $reading) {
    if ($reading === null) {
        $missing++;
    } else {
        $total += $reading;
    }
}
return [$total, $missing];
}
