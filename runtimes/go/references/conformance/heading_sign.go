return -heading
}
