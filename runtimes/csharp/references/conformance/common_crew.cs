    var both = new HashSet<string>(first);
    both.IntersectWith(second);
    return both;
}
