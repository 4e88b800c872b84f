    return $value;
}
