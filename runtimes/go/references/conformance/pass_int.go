return value
}
