return in_array($type, $in, true) ? $end - $from : $default_;
}
