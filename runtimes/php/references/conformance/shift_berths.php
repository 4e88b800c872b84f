$shifted = [];
foreach ($owners as $berth => $vessel) {
    $shifted[$berth + $offset] = $vessel;
}
return $shifted;
}
