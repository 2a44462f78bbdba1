using System.Buffers;

namespace WindScript.Cli;

/// <summary>
/// Runs work over a stream of items on several threads and hands the results to one writer in
/// the original order. Items are taken in batches; at most <c>window</c> batches are claimed
/// but not yet written, so memory stays bounded however long the stream. Each worker thread has
/// its own state (scratch buffers, formatters).
/// </summary>
public static class OrderedBatches
{
    /// <param name="source">The items, enumerated under a lock (one thread at a time).</param>
    /// <param name="createState">Makes one worker's state.</param>
    /// <param name="work">Processes one item, appending its output to the batch buffer.</param>
    /// <param name="write">Receives each batch's output, in order, on the calling thread, with the number of items it covered.</param>
    public static void Run<TItem, TState>(IEnumerable<TItem> source, int workers, int batchSize, int window,
        Func<TState> createState, Action<TState, TItem, ArrayBufferWriter<byte>> work, Action<ReadOnlyMemory<byte>, int> write)
    {
        workers = Math.Max(1, workers);
        batchSize = Math.Max(1, batchSize);
        window = Math.Max(workers, window);
        var gate = new object();
        using var items = source.GetEnumerator();
        var finished = new Dictionary<long, (ArrayBufferWriter<byte> Output, int Count)>();
        var spare = new Stack<ArrayBufferWriter<byte>>();
        long claimed = 0, written = 0;
        bool exhausted = false;
        Exception? failure = null;

        void Worker()
        {
            try
            {
                var state = createState();
                var batch = new TItem[batchSize];
                while (true)
                {
                    long sequence;
                    int count = 0;
                    ArrayBufferWriter<byte> output;
                    lock (gate)
                    {
                        while (!exhausted && failure is null && claimed - written >= window) Monitor.Wait(gate);
                        if (exhausted || failure is not null) return;
                        while (count < batchSize && items.MoveNext()) batch[count++] = items.Current;
                        if (count < batchSize) exhausted = true;
                        if (count == 0) { Monitor.PulseAll(gate); return; }
                        sequence = claimed++;
                        output = spare.Count > 0 ? spare.Pop() : new ArrayBufferWriter<byte>(16 * 1024);
                    }
                    for (int i = 0; i < count; i++) work(state, batch[i], output);
                    lock (gate)
                    {
                        finished[sequence] = (output, count);
                        Monitor.PulseAll(gate);
                    }
                }
            }
            catch (Exception e)
            {
                lock (gate)
                {
                    failure ??= e;
                    Monitor.PulseAll(gate);
                }
            }
        }

        var threads = new Thread[workers];
        for (int i = 0; i < workers; i++)
        {
            threads[i] = new Thread(Worker) { IsBackground = true, Name = $"sweep worker {i + 1}" };
            threads[i].Start();
        }
        try
        {
            while (true)
            {
                (ArrayBufferWriter<byte> Output, int Count) next;
                lock (gate)
                {
                    while (failure is null && !finished.ContainsKey(written) && !(exhausted && written == claimed)) Monitor.Wait(gate);
                    if (failure is not null) break;
                    if (!finished.Remove(written, out next)) break;   // exhausted and everything written
                }
                write(next.Output.WrittenMemory, next.Count);
                next.Output.ResetWrittenCount();
                lock (gate)
                {
                    spare.Push(next.Output);
                    written++;
                    Monitor.PulseAll(gate);
                }
            }
        }
        finally
        {
            lock (gate)
            {
                exhausted = true;
                Monitor.PulseAll(gate);
            }
            foreach (var t in threads) t.Join();
        }
        if (failure is not null) throw new AggregateException("a sweep worker failed", failure);
    }
}
