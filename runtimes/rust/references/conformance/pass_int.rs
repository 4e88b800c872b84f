value
}
