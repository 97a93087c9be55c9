Console.WriteLine("benchmarks come with the placement work");
