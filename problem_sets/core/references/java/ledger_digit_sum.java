    long sum = 0;
    long rest = n;
    while (rest != 0) {
        sum += Math.abs(rest % 10);
        rest /= 10;
    }
    return sum;
}
