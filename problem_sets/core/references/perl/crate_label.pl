    return (defined $name && length $name ? $name : 'Crate') . " #$number";
}
