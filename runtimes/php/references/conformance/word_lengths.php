$lengths = [];
foreach ($words as $word) {
    $lengths[$word] = mb_strlen($word);
}
return $lengths;
}
