$averages = [];
for ($end = $window; $end <= count($values); $end++) {
    $averages[] = array_sum(array_slice($values, $end - $window, $window)) / $window;
}
return $averages;
}
