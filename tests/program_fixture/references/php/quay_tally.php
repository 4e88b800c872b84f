<?php
$numbers = array_map('intval', preg_split('/\s+/', trim(stream_get_contents(STDIN))));
$weights = array_slice($numbers, 1, $numbers[0]);
echo array_sum($weights) . " " . max($weights) . "\n";
