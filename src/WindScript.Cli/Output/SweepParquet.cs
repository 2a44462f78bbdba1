using System.Buffers;
using System.Buffers.Binary;
using Parquet;
using Parquet.Schema;
using WindScript.Sweep;

namespace WindScript.Cli.Output;

/// <summary>
/// Sweep records as Apache Parquet (Parquet.Net, fully managed): one typed column per record
/// field, named as in JSON Lines, and the winding factors as a list column <c>windingFactors</c>
/// (element i is electrical order i + 1). Numbers are the doubles themselves, not the six
/// decimals of the text formats. Rows are written in row groups as the sweep streams, so memory
/// holds at most one row group; every part of a sharded sweep has the same schema, so a
/// directory of parts reads as one dataset.
/// </summary>
public sealed class SweepParquet
{
    private static readonly DataField<int> Slots = new("slots", false), Poles = new("poles", false), Phases = new("phases", false),
        Layers = new("layers", false), Pitch = new("pitch", false), Periodicity = new("periodicity", false),
        Cogging = new("coggingOrder", false), Paths = new("maxParallelPaths", false), Lowest = new("lowestOrder", false);
    private static readonly DataField<double> Q = new("q", false), Leakage = new("differentialLeakage", false), Factor = new("element");
    private static readonly DataField<bool> Sub = new("subharmonics", false), Even = new("evenHarmonics", false), Adjacent = new("adjacentOrders", false);
    private static readonly ListField Factors = new("windingFactors", Factor);

    /// <summary>The schema of every sweep Parquet file, in record order (as JSON Lines and CSV).</summary>
    public static readonly ParquetSchema Schema = new(Slots, Poles, Phases, Layers, Pitch, Q, Periodicity, Cogging, Paths, Leakage, Sub, Lowest, Even, Adjacent, Factors);

    private readonly ParquetWriter _writer;
    private readonly int _rowsPerGroup;
    private readonly int[][] _ints;
    private readonly double[] _q, _leakage;
    private readonly bool[] _sub, _even, _adjacent;
    private readonly double?[] _factors;
    private readonly int[] _repetition;
    private int _rows, _values;

    /// <param name="output">A writable, seekable stream (Parquet writes its footer last).</param>
    /// <param name="orders">Winding factors per record, to size the row groups (about half a million factors each).</param>
    public SweepParquet(Stream output, int orders)
    {
        _writer = ParquetWriter.CreateAsync(Schema, output).GetAwaiter().GetResult();
        _rowsPerGroup = Math.Clamp((1 << 19) / Math.Max(1, orders), 64, 1 << 16);
        _ints = Enumerable.Range(0, 9).Select(_ => new int[_rowsPerGroup]).ToArray();
        _q = new double[_rowsPerGroup];
        _leakage = new double[_rowsPerGroup];
        _sub = new bool[_rowsPerGroup];
        _even = new bool[_rowsPerGroup];
        _adjacent = new bool[_rowsPerGroup];
        _factors = new double?[_rowsPerGroup * orders];
        _repetition = new int[_rowsPerGroup * orders];
    }

    /// <summary>Takes a batch of records encoded by <see cref="Encoding"/>, writing a row group whenever one is full.</summary>
    public void Add(ReadOnlySpan<byte> batch)
    {
        while (batch.Length > 0)
        {
            int n = BinaryPrimitives.ReadInt32LittleEndian(batch);
            var fields = batch[4..];
            if (_values + n > _factors.Length) Flush();
            for (int c = 0; c < 9; c++) _ints[c][_rows] = BinaryPrimitives.ReadInt32LittleEndian(fields[(4 * c)..]);
            _q[_rows] = BinaryPrimitives.ReadDoubleLittleEndian(fields[36..]);
            _leakage[_rows] = BinaryPrimitives.ReadDoubleLittleEndian(fields[44..]);
            _sub[_rows] = fields[52] != 0;
            _even[_rows] = fields[53] != 0;
            _adjacent[_rows] = fields[54] != 0;
            for (int i = 0; i < n; i++)
            {
                _factors[_values + i] = BinaryPrimitives.ReadDoubleLittleEndian(fields[(Encoding.FixedBytes + 8 * i)..]);
                _repetition[_values + i] = i == 0 ? 0 : 1;
            }
            _values += n;
            _rows++;
            if (_rows == _rowsPerGroup) Flush();
            batch = batch[(4 + Encoding.FixedBytes + 8 * n)..];
        }
    }

    /// <summary>Writes the last row group and the footer. A writer abandoned before this leaves a file no reader accepts; the part file around it is then discarded.</summary>
    public void Finish()
    {
        Flush();
        _writer.DisposeAsync().AsTask().GetAwaiter().GetResult();
    }

    private void Flush()
    {
        if (_rows == 0) return;
        using var group = _writer.CreateRowGroup();
        DataField<int>[] intFields = [Slots, Poles, Phases, Layers, Pitch, Periodicity, Cogging, Paths, Lowest];
        void Ints(DataField<int> f) => group.WriteAsync<int>(f, _ints[Array.IndexOf(intFields, f)].AsMemory(0, _rows)).GetAwaiter().GetResult();
        Ints(Slots);
        Ints(Poles);
        Ints(Phases);
        Ints(Layers);
        Ints(Pitch);
        group.WriteAsync<double>(Q, _q.AsMemory(0, _rows)).GetAwaiter().GetResult();
        Ints(Periodicity);
        Ints(Cogging);
        Ints(Paths);
        group.WriteAsync<double>(Leakage, _leakage.AsMemory(0, _rows)).GetAwaiter().GetResult();
        group.WriteAsync<bool>(Sub, _sub.AsMemory(0, _rows)).GetAwaiter().GetResult();
        Ints(Lowest);
        group.WriteAsync<bool>(Even, _even.AsMemory(0, _rows)).GetAwaiter().GetResult();
        group.WriteAsync<bool>(Adjacent, _adjacent.AsMemory(0, _rows)).GetAwaiter().GetResult();
        group.WriteAsync<double>(Factor, _factors.AsMemory(0, _values), _repetition.AsMemory(0, _values)).GetAwaiter().GetResult();
        _rows = 0;
        _values = 0;
    }

    /// <summary>
    /// How a worker thread hands a record to the writer: a length-prefixed little-endian block
    /// (factor count, nine integers, q, leakage, three flags, the factors), decoded by <see cref="Add"/>.
    /// </summary>
    public sealed class Encoding : SweepFormat
    {
        internal const int FixedBytes = 9 * 4 + 2 * 8 + 4;

        public override string Header => "";

        public override void Write(SweepRecord r, IBufferWriter<byte> output)
        {
            int n = r.WindingFactors.Length;
            var s = output.GetSpan(4 + FixedBytes + 8 * n);
            BinaryPrimitives.WriteInt32LittleEndian(s, n);
            var f = s[4..];
            Span<int> ints = [r.Slots, r.Poles, r.Phases, r.Layers, r.Pitch, r.Periodicity, r.CoggingOrder, r.Sections, r.LowestOrder];
            for (int c = 0; c < ints.Length; c++) BinaryPrimitives.WriteInt32LittleEndian(f[(4 * c)..], ints[c]);
            BinaryPrimitives.WriteDoubleLittleEndian(f[36..], r.SlotsPerPolePerPhase);
            BinaryPrimitives.WriteDoubleLittleEndian(f[44..], r.DifferentialLeakage);
            f[52] = r.Subharmonics ? (byte)1 : (byte)0;
            f[53] = r.EvenHarmonics ? (byte)1 : (byte)0;
            f[54] = r.AdjacentOrders ? (byte)1 : (byte)0;
            f[55] = 0;
            for (int i = 0; i < n; i++) BinaryPrimitives.WriteDoubleLittleEndian(f[(FixedBytes + 8 * i)..], r.WindingFactors[i]);
            output.Advance(4 + FixedBytes + 8 * n);
        }
    }
}
