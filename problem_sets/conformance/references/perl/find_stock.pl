    return $stock->{$item};
}
