using System;
using System.Linq;

public class Program
{
    public static void Main()
    {
        long[] numbers = Console.In.ReadToEnd()
            .Split((char[])null, StringSplitOptions.RemoveEmptyEntries).Select(long.Parse).ToArray();
        long[] weights = numbers.Skip(1).Take((int)numbers[0]).ToArray();
        Console.WriteLine(weights.Sum() + " " + weights.Max());
    }
}
