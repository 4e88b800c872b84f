$left = mb_str_split($a);
$right = mb_str_split($b);
if (count($left) !== count($right)) {
    return null;
}
return count(array_diff_assoc($left, $right));
}
