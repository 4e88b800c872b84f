// tails[k]: the smallest last reading of a rising chain of k + 1 readings seen so far.
$tails = [];
foreach ($values as $value) {
    $low = 0;
    $high = count($tails);
    while ($low < $high) {
        $mid = intdiv($low + $high, 2);
        if ($tails[$mid] < $value) {
            $low = $mid + 1;
        } else {
            $high = $mid;
        }
    }
    $tails[$low] = $value;
}
return count($tails);
}
