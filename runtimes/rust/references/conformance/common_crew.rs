first.intersection(&second).cloned().collect()
}
