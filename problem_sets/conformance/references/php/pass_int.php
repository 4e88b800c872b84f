return $value;
}
