if in_.contains(&type_) {
    end - from
} else {
    default
}
}
