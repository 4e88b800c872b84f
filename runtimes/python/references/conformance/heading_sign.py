return -heading
