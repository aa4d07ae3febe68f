using System.Diagnostics;
using Electrostat.Numerics.Parallelism;

namespace Electrostat.Numerics.Sparse;

/// <summary>
/// The symbolic part of finite-element assembly, done once per mesh: the CSR sparsity pattern that element
/// contributions produce, plus a map from every element-matrix entry to its slot in the CSR value array.
/// Numeric assembly is then a plain scatter (no search, no dictionary).
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
/// The element matrix convention is row-major k × k in the element's local node order; entry (a, b) is
/// added to matrix entry (rowDof(node a), columnDof(node b)) unless either map gives −1.
/// </para>
/// </remarks>
public sealed class CsrAssemblyPlan
{
    private readonly int[] _slots;
    private readonly int[] _rowPointers;
    private readonly int[] _columnIndices;

    private CsrAssemblyPlan(int rows, int columns, int nodesPerElement, int elementCount, int[] rowPointers, int[] columnIndices, int[] slots)
    {
        Rows = rows;
        Columns = columns;
        NodesPerElement = nodesPerElement;
        ElementCount = elementCount;
        _rowPointers = rowPointers;
        _columnIndices = columnIndices;
        _slots = slots;
    }

    /// <summary>Number of matrix rows (row dofs).</summary>
    public int Rows { get; }

    /// <summary>Number of matrix columns (column dofs).</summary>
    public int Columns { get; }

    /// <summary>Nodes per element (k); element matrices are k × k.</summary>
    public int NodesPerElement { get; }

    /// <summary>Number of elements.</summary>
    public int ElementCount { get; }

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
        for (int t = 0; t < connectivity.Length; t++)
        {
            int r = rowDofOfNode[connectivity[t]];
            if (r >= 0)
            {
                elemList[fill[r]++] = t / k;
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

        // Element entry -> CSR slot. Rows are short (about 7 for P1 triangles), so a linear scan wins; merged
        // floating-conductor rows can be long, so those use binary search.
        var slots = new int[elements * k * k];
        var elementParts = RowPartition.Even(elements, elements > 100_000 ? ParallelPolicy.DefaultWorkers : 1);
        Parallel.For(0, elementParts.Count, p =>
        {
            for (int e = elementParts.Start(p); e < elementParts.End(p); e++)
            {
                int eBase = e * k;
                int sBase = e * k * k;
                for (int a = 0; a < k; a++)
                {
                    int r = rowDofOfNode[connectivity[eBase + a]];
                    for (int b = 0; b < k; b++)
                    {
                        int c = columnDofOfNode[connectivity[eBase + b]];
                        slots[sBase + a * k + b] = r < 0 || c < 0 ? -1 : FindSlot(columnIndices, rowPointers[r], rowPointers[r + 1], c);
                    }
                }
            }
        });
        return new CsrAssemblyPlan(rowCount, columnCount, k, elements, rowPointers, columnIndices, slots);
    }

    /// <summary>
    /// Returns a new matrix with this plan's pattern and zero values. Matrices from the same plan share the
    /// (immutable) pattern arrays and own their value arrays.
    /// </summary>
    public CsrMatrix CreateMatrix() =>
        new(Rows, Columns, _rowPointers, _columnIndices, new double[NonZeroCount], validate: false);

    /// <summary>The CSR value-array slot of each entry of element <paramref name="element"/>'s matrix (−1 = dropped).</summary>
    public ReadOnlySpan<int> ElementSlots(int element) => _slots.AsSpan(element * NodesPerElement * NodesPerElement, NodesPerElement * NodesPerElement);

    /// <summary>Adds one element matrix (row-major k × k) into <paramref name="matrix"/>'s values.</summary>
    public void AddElement(CsrMatrix matrix, int element, ReadOnlySpan<double> elementMatrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        if (!ReferenceEquals(matrix.RowPointers, _rowPointers))
        {
            throw new ArgumentException("The matrix was not created by this assembly plan.", nameof(matrix));
        }
        int kk = NodesPerElement * NodesPerElement;
        if ((uint)element >= (uint)ElementCount || elementMatrix.Length != kk)
        {
            throw new ArgumentException($"Element {element} needs a {NodesPerElement} x {NodesPerElement} element matrix.");
        }
        var slots = _slots.AsSpan(element * kk, kk);
        var values = matrix.Values;
        for (int t = 0; t < kk; t++)
        {
            int s = slots[t];
            if (s >= 0)
            {
                values[s] += elementMatrix[t];
            }
        }
    }

    /// <summary>
    /// Assembles all elements into a new matrix, computing element matrices on all cores. Each worker scatters
    /// into its own value array and the arrays are summed at the end, so there are no races and the result
    /// does not depend on thread timing.
    /// </summary>
    /// <param name="writer">Computes one element matrix; called concurrently, must be thread-safe.</param>
    public CsrMatrix Assemble(ElementMatrixWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        var matrix = CreateMatrix();
        int kk = NodesPerElement * NodesPerElement;
        int workers = ElementCount > 50_000 ? ParallelPolicy.DefaultWorkers : 1;
        var parts = RowPartition.Even(ElementCount, workers);
        var buffers = new double[parts.Count][];
        buffers[0] = matrix.Values;
        Parallel.For(0, parts.Count, p =>
        {
            var values = p == 0 ? matrix.Values : new double[NonZeroCount];
            buffers[p] = values;
            Span<double> ke = stackalloc double[kk];
            for (int e = parts.Start(p); e < parts.End(p); e++)
            {
                ke.Clear();
                writer(e, ke);
                var slots = _slots.AsSpan(e * kk, kk);
                for (int t = 0; t < kk; t++)
                {
                    int s = slots[t];
                    if (s >= 0)
                    {
                        values[s] += ke[t];
                    }
                }
            }
        });
        for (int p = 1; p < parts.Count; p++)
        {
            Vectors.VectorKernels.Axpy(1.0, buffers[p], matrix.Values);
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
        if (end - start <= 16)
        {
            for (int s = start; s < end; s++)
            {
                if (columns[s] == column)
                {
                    return s;
                }
            }
        }
        else
        {
            int s = Array.BinarySearch(columns, start, end - start, column);
            if (s >= 0)
            {
                return s;
            }
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
