-heading
}
