$groups = [];
foreach ($words as $word) {
    if ($word !== '') {
        $groups[mb_substr($word, 0, 1)][] = $word;
    }
}
return $groups;
}
