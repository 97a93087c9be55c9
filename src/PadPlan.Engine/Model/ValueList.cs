using System.Collections;
using System.Collections.Immutable;

namespace PadPlan.Model;

/// <summary>An immutable list that compares by its items, so records holding lists keep value equality.</summary>
public sealed class ValueList<T> : IReadOnlyList<T>, IEquatable<ValueList<T>>
{
    private readonly ImmutableArray<T> _items;

    public static ValueList<T> Empty { get; } = new(ImmutableArray<T>.Empty);

    public ValueList(IEnumerable<T> items) => _items = items.ToImmutableArray();

    private ValueList(ImmutableArray<T> items) => _items = items;

    public T this[int index] => _items[index];
    public int Count => _items.Length;

    public ValueList<T> Add(T item) => new(_items.Add(item));
    public ValueList<T> SetItem(int index, T item) => new(_items.SetItem(index, item));
    public ValueList<T> RemoveAt(int index) => new(_items.RemoveAt(index));

    public ImmutableArray<T>.Enumerator GetEnumerator() => _items.GetEnumerator();
    IEnumerator<T> IEnumerable<T>.GetEnumerator() => ((IEnumerable<T>)_items).GetEnumerator();
    IEnumerator IEnumerable.GetEnumerator() => ((IEnumerable)_items).GetEnumerator();

    public bool Equals(ValueList<T>? other) =>
        other is not null && _items.AsSpan().SequenceEqual(other._items.AsSpan(), EqualityComparer<T>.Default);

    public override bool Equals(object? obj) => Equals(obj as ValueList<T>);

    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var item in _items) hash.Add(item);
        return hash.ToHashCode();
    }

    public override string ToString() => $"[{string.Join(", ", _items)}]";

    public static implicit operator ValueList<T>(T[] items) => new(items);
}

/// <summary>Factory helpers for <see cref="ValueList{T}"/>.</summary>
public static class ValueList
{
    public static ValueList<T> Of<T>(params T[] items) => new(items);
    public static ValueList<T> ToValueList<T>(this IEnumerable<T> items) => new(items);
}
