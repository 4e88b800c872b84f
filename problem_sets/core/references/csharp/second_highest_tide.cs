    long? top = null;
    long? second = null;
    foreach (long value in values)
    {
        if (top == null || value > top)
        {
            second = top;
            top = value;
        }
        else if (value < top && (second == null || value > second))
        {
            second = value;
        }
    }
    return second;
}
