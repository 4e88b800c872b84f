return ($name === null || $name === '' ? 'Crate' : $name) . ' #' . $number;
}
