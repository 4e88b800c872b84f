// A stack of the lighthouses still waiting for a taller one, heights non-increasing upward.
$result = array_fill(0, count($heights), -1);
$waiting = [];
foreach ($heights as $i => $height) {
    while ($waiting !== [] && $heights[end($waiting)] < $height) {
        $result[array_pop($waiting)] = $i;
    }
    $waiting[] = $i;
}
return $result;
}
