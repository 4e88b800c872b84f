$taken = array_flip($taken);
$free = [];
for ($berth = 1; $berth <= $count; $berth++) {
    if (!isset($taken[$berth])) {
        $free[] = $berth;
    }
}
return $free;
}
