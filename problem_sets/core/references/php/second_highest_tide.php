$top = null;
$second = null;
foreach ($values as $value) {
    if ($top === null || $value > $top) {
        $second = $top;
        $top = $value;
    } elseif ($value < $top && ($second === null || $value > $second)) {
        $second = $value;
    }
}
return $second;
}
