$groups = [];
foreach ($names as $name) {
    if ($name !== '') {
        $groups[mb_substr($name, 0, 1)][] = $name;
    }
}
return $groups;
}
