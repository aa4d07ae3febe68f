using System.Diagnostics;
using Electrostat.Numerics.Parallelism;

namespace Electrostat.Numerics.Sparse;

/// <summary>
/// The symbolic part of finite-element assembly, done once per mesh: the CSR sparsity pattern (sorted columns per
/// row) that element contributions produce. Numeric assembly then scatters each element-matrix entry by a short
/// linear search in its row (about 7 entries for P1 triangles; binary search in long rows): no dictionary, no
/// per-entry allocation. Keeping no element-to-slot table saves k²·4 bytes per element of memory traffic, which
/// costs more than the search at 10⁶ unknowns.
/// </summary>
/// <remarks>
/// <para>
/// Degrees of freedom. Elements list <em>nodes</em>; the plan maps nodes to matrix rows and columns through
/// node→dof maps, where −1 means "not in this matrix". This gives the FEM layer, in one pass each:
/// the reduced system matrix (Dirichlet nodes mapped to −1, the nodes of a floating conductor all mapped
/// to one shared dof: their contributions are summed, which is exactly DOF merging), and rectangular
/// coupling blocks (e.g. rows = free dofs, columns = Dirichlet nodes, to move known potentials to the
/// right-hand side; or rows = conductor nodes, columns = all nodes, for reaction charges).
/// </para>
/// <para>
/// The plan keeps references to the connectivity and node→dof arrays (copying them would cost more memory
/// traffic than the symbolic pass itself at 10⁶ nodes); they must not be changed while the plan is in use.
/// </para>
/// <para>
/// The element matrix convention is row-major k × k in the element's local node order; entry (a, b) is
/// added to matrix entry (rowDof(node a), columnDof(node b)) unless either map gives −1.
/// </para>
/// </remarks>
public sealed class CsrAssemblyPlan
{
    private readonly int[] _connectivity;
    private readonly int[] _rowDofOfNode;
    private readonly int[] _columnDofOfNode;
    private readonly int[] _rowPointers;
    private readonly int[] _columnIndices;

    private CsrAssemblyPlan(int rows, int columns, int nodesPerElement, int[] connectivity, int[] rowDofOfNode, int[] columnDofOfNode, int[] rowPointers, int[] columnIndices)
    {
        Rows = rows;
        Columns = columns;
        NodesPerElement = nodesPerElement;
        ElementCount = connectivity.Length / nodesPerElement;
        _connectivity = connectivity;
        _rowDofOfNode = rowDofOfNode;
        _columnDofOfNode = columnDofOfNode;
        _rowPointers = rowPointers;
        _columnIndices = columnIndices;
    }

    /// <summary>Number of matrix rows (row dofs).</summary>
    public int Rows { get; }

    /// <summary>Number of matrix columns (column dofs).</summary>
    public int Columns { get; }

    /// <summary>Nodes per element (k); element matrices are k × k.</summary>
    public int NodesPerElement { get; }

    /// <summary>Number of elements.</summary>
    public int ElementCount { get; }

    /// <summary>Row pointers of the pattern (shared with every matrix the plan creates; do not modify).</summary>
    internal int[] PatternRowPointers => _rowPointers;

    /// <summary>Column indices of the pattern (shared with every matrix the plan creates; do not modify).</summary>
    internal int[] PatternColumnIndices => _columnIndices;

    /// <summary>Number of stored entries of the pattern.</summary>
    public int NonZeroCount => _rowPointers[Rows];

    /// <summary>
    /// Builds the plan for a square matrix over one node→dof map (the usual system matrix).
    /// </summary>
    /// <param name="connectivity">Element nodes, <paramref name="nodesPerElement"/> consecutive entries per element.</param>
    /// <param name="nodesPerElement">k, e.g. 3 for linear triangles.</param>
    /// <param name="dofOfNode">dof of each node, or −1 if eliminated. Several nodes may share a dof.</param>
    /// <param name="dofCount">Number of dofs; every non-negative map entry must be below it.</param>
    public static CsrAssemblyPlan Create(int[] connectivity, int nodesPerElement, int[] dofOfNode, int dofCount)
        => Create(connectivity, nodesPerElement, dofOfNode, dofCount, dofOfNode, dofCount);

    /// <summary>Builds the plan for a square matrix with one dof per node (identity map).</summary>
    /// <param name="connectivity">Element nodes, <paramref name="nodesPerElement"/> consecutive entries per element.</param>
    /// <param name="nodesPerElement">k, e.g. 3 for linear triangles.</param>
    /// <param name="nodeCount">Number of nodes.</param>
    public static CsrAssemblyPlan Create(int[] connectivity, int nodesPerElement, int nodeCount)
    {
        var identity = new int[nodeCount];
        for (int i = 0; i < nodeCount; i++)
        {
            identity[i] = i;
        }
        return Create(connectivity, nodesPerElement, identity, nodeCount);
    }

    /// <summary>
    /// Builds the plan for a (possibly rectangular) matrix whose rows and columns use different node→dof maps.
    /// </summary>
    /// <param name="connectivity">Element nodes, <paramref name="nodesPerElement"/> consecutive entries per element.</param>
    /// <param name="nodesPerElement">k, e.g. 3 for linear triangles.</param>
    /// <param name="rowDofOfNode">Row index of each node, or −1 if the node has no row.</param>
    /// <param name="rowCount">Number of rows.</param>
    /// <param name="columnDofOfNode">Column index of each node, or −1 if the node has no column.</param>
    /// <param name="columnCount">Number of columns.</param>
    public static CsrAssemblyPlan Create(int[] connectivity, int nodesPerElement, int[] rowDofOfNode, int rowCount, int[] columnDofOfNode, int columnCount)
    {
        ArgumentNullException.ThrowIfNull(connectivity);
        ArgumentNullException.ThrowIfNull(rowDofOfNode);
        ArgumentNullException.ThrowIfNull(columnDofOfNode);
        if (nodesPerElement < 1 || connectivity.Length % nodesPerElement != 0)
        {
            throw new ArgumentException($"Connectivity length {connectivity.Length} is not a multiple of {nodesPerElement} nodes per element.", nameof(connectivity));
        }
        if (rowDofOfNode.Length != columnDofOfNode.Length)
        {
            throw new ArgumentException("Row and column node→dof maps must cover the same nodes.", nameof(columnDofOfNode));
        }
        int nodeCount = rowDofOfNode.Length;
        CheckMap(rowDofOfNode, rowCount, nameof(rowDofOfNode));
        CheckMap(columnDofOfNode, columnCount, nameof(columnDofOfNode));
        for (int t = 0; t < connectivity.Length; t++)
        {
            if ((uint)connectivity[t] >= (uint)nodeCount)
            {
                throw new ArgumentException($"Element {t / nodesPerElement} refers to node {connectivity[t]}, outside [0, {nodeCount}).", nameof(connectivity));
            }
        }

        int k = nodesPerElement;
        int elements = connectivity.Length / k;

        // Row dof -> elements touching it (counting sort). An element is listed once per local node that maps
        // to the row; duplicates are harmless because the column marker below removes repeats.
        var elemPtr = new int[rowCount + 1];
        for (int t = 0; t < connectivity.Length; t++)
        {
            int r = rowDofOfNode[connectivity[t]];
            if (r >= 0)
            {
                elemPtr[r + 1]++;
            }
        }
        for (int r = 0; r < rowCount; r++)
        {
            elemPtr[r + 1] += elemPtr[r];
        }
        var elemList = new int[elemPtr[rowCount]];
        var fill = new int[rowCount];
        Array.Copy(elemPtr, fill, rowCount);
        for (int e = 0, t = 0; e < elements; e++)
        {
            for (int a = 0; a < k; a++, t++)
            {
                int r = rowDofOfNode[connectivity[t]];
                if (r >= 0)
                {
                    elemList[fill[r]++] = e;
                }
            }
        }

        // Pass 1: distinct columns per row. Pass 2: write them and sort. Rows are split over the cores; each
        // worker owns a marker array indexed by column.
        var rowPointers = new int[rowCount + 1];
        var parts = RowPartition.ByEntries(elemPtr, rowCount, connectivity.Length > 200_000 ? ParallelPolicy.DefaultWorkers : 1);
        Parallel.For(0, parts.Count, p =>
        {
            var marker = new int[columnCount];
            Array.Fill(marker, -1);
            for (int r = parts.Start(p); r < parts.End(p); r++)
            {
                int count = 0;
                for (int q = elemPtr[r]; q < elemPtr[r + 1]; q++)
                {
                    int eBase = elemList[q] * k;
                    for (int b = 0; b < k; b++)
                    {
                        int c = columnDofOfNode[connectivity[eBase + b]];
                        if (c >= 0 && marker[c] != r)
                        {
                            marker[c] = r;
                            count++;
                        }
                    }
                }
                rowPointers[r + 1] = count;
            }
        });
        for (int r = 0; r < rowCount; r++)
        {
            rowPointers[r + 1] += rowPointers[r];
        }
        var columnIndices = new int[rowPointers[rowCount]];
        Parallel.For(0, parts.Count, p =>
        {
            var marker = new int[columnCount];
            Array.Fill(marker, -1);
            for (int r = parts.Start(p); r < parts.End(p); r++)
            {
                int pos = rowPointers[r];
                for (int q = elemPtr[r]; q < elemPtr[r + 1]; q++)
                {
                    int eBase = elemList[q] * k;
                    for (int b = 0; b < k; b++)
                    {
                        int c = columnDofOfNode[connectivity[eBase + b]];
                        if (c >= 0 && marker[c] != r)
                        {
                            marker[c] = r;
                            columnIndices[pos++] = c;
                        }
                    }
                }
                Debug.Assert(pos == rowPointers[r + 1]);
                SortSmall(columnIndices.AsSpan(rowPointers[r], pos - rowPointers[r]));
            }
        });

        return new CsrAssemblyPlan(rowCount, columnCount, k, connectivity, rowDofOfNode, columnDofOfNode, rowPointers, columnIndices);
    }

    /// <summary>
    /// Returns a new matrix with this plan's pattern and zero values. Matrices from the same plan share the
    /// (immutable) pattern arrays and own their value arrays.
    /// </summary>
    public CsrMatrix CreateMatrix() =>
        new(Rows, Columns, _rowPointers, _columnIndices, new double[NonZeroCount], validate: false);

    /// <summary>Adds one element matrix (row-major k × k) into <paramref name="matrix"/>'s values.</summary>
    public void AddElement(CsrMatrix matrix, int element, ReadOnlySpan<double> elementMatrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        if (!ReferenceEquals(matrix.RowPointers, _rowPointers))
        {
            throw new ArgumentException("The matrix was not created by this assembly plan.", nameof(matrix));
        }
        int k = NodesPerElement;
        if ((uint)element >= (uint)ElementCount || elementMatrix.Length != k * k)
        {
            throw new ArgumentException($"Element {element} needs a {k} x {k} element matrix.");
        }
        var values = matrix.Values;
        int eBase = element * k;
        for (int a = 0; a < k; a++)
        {
            int r = _rowDofOfNode[_connectivity[eBase + a]];
            if (r < 0)
            {
                continue;
            }
            for (int b = 0; b < k; b++)
            {
                int c = _columnDofOfNode[_connectivity[eBase + b]];
                if (c >= 0)
                {
                    values[FindSlot(_columnIndices, _rowPointers[r], _rowPointers[r + 1], c)] += elementMatrix[a * k + b];
                }
            }
        }
    }

    /// <summary>
    /// Assembles all elements into a new matrix, computing element matrices on all cores. Elements and rows are
    /// split into the same number of contiguous ranges; a worker adds entries of its own rows directly and
    /// queues the others, which are added afterwards in worker order. There are no races and the result does
    /// not depend on thread timing; with a mesh numbered with locality (the usual case) almost nothing is queued.
    /// </summary>
    /// <param name="writer">Computes one element matrix; called concurrently, must be thread-safe.</param>
    public CsrMatrix Assemble(ElementMatrixWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        var matrix = CreateMatrix();
        int k = NodesPerElement;
        int kk = k * k;
        int workers = ElementCount > 50_000 ? ParallelPolicy.DefaultWorkers : 1;
        var elementParts = RowPartition.Even(ElementCount, workers);
        var rowParts = RowPartition.ByEntries(_rowPointers, Rows, elementParts.Count);
        var deferredSlots = new List<int>[elementParts.Count];
        var deferredValues = new List<double>[elementParts.Count];
        var values = matrix.Values;
        Parallel.For(0, elementParts.Count, p =>
        {
            var slots = new List<int>();
            var vals = new List<double>();
            int ownStart = rowParts.Start(Math.Min(p, rowParts.Count - 1));
            int ownEnd = rowParts.End(Math.Min(p, rowParts.Count - 1));
            Span<double> ke = stackalloc double[kk];
            for (int e = elementParts.Start(p); e < elementParts.End(p); e++)
            {
                ke.Clear();
                writer(e, ke);
                int eBase = e * k;
                for (int a = 0; a < k; a++)
                {
                    int r = _rowDofOfNode[_connectivity[eBase + a]];
                    if (r < 0)
                    {
                        continue;
                    }
                    int rs = _rowPointers[r], re = _rowPointers[r + 1];
                    bool own = r >= ownStart && r < ownEnd;
                    for (int b = 0; b < k; b++)
                    {
                        int c = _columnDofOfNode[_connectivity[eBase + b]];
                        if (c < 0)
                        {
                            continue;
                        }
                        int slot = FindSlot(_columnIndices, rs, re, c);
                        if (own)
                        {
                            values[slot] += ke[a * k + b];
                        }
                        else
                        {
                            slots.Add(slot);
                            vals.Add(ke[a * k + b]);
                        }
                    }
                }
            }
            deferredSlots[p] = slots;
            deferredValues[p] = vals;
        });
        for (int p = 0; p < elementParts.Count; p++)
        {
            var slots = deferredSlots[p];
            var vals = deferredValues[p];
            for (int t = 0; t < slots.Count; t++)
            {
                values[slots[t]] += vals[t];
            }
        }
        return matrix;
    }

    private static void CheckMap(int[] map, int count, string name)
    {
        for (int i = 0; i < map.Length; i++)
        {
            if (map[i] < -1 || map[i] >= count)
            {
                throw new ArgumentException($"Node {i} maps to dof {map[i]}, outside [-1, {count}).", name);
            }
        }
    }

    private static int FindSlot(int[] columns, int start, int end, int column)
    {
        // Short rows (P1: about 7 entries): a vectorised scan; long rows (merged floating-conductor dofs): binary search.
        int s = end - start <= 32
            ? columns.AsSpan(start, end - start).IndexOf(column)
            : Array.BinarySearch(columns, start, end - start, column) - start;
        if (s >= 0)
        {
            return start + s;
        }
        Debug.Fail("Column missing from the pattern the plan built itself.");
        return -1;
    }

    private static void SortSmall(Span<int> a)
    {
        if (a.Length > 24)
        {
            a.Sort();
            return;
        }
        for (int i = 1; i < a.Length; i++)
        {
            int v = a[i];
            int j = i - 1;
            while (j >= 0 && a[j] > v)
            {
                a[j + 1] = a[j];
                j--;
            }
            a[j + 1] = v;
        }
    }
}
