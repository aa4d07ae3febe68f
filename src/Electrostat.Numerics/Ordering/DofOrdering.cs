using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Ordering;

/// <summary>
/// Renumbering of degrees of freedom for locality: the reverse Cuthill–McKee ordering (Cuthill and McKee 1969,
/// "Reducing the bandwidth of sparse symmetric matrices", Proc. 24th ACM National Conference; reversed as proposed
/// by George 1971), started in each connected component from a pseudo-peripheral node (Gibbs, Poole and Stockmeyer
/// 1976, SIAM J. Numer. Anal. 13:236–250, the level-structure search).
/// </summary>
/// <remarks>
/// Why it matters here: the solver's kernels split rows into contiguous blocks per core, the ℓ1 hybrid
/// Gauss–Seidel smoother is Gauss–Seidel only inside a block, and aggregation is greedy in row order. A dof
/// numbering without locality (e.g. vertices appended by mesh refinement) makes the smoother nearly Jacobi, the
/// aggregates ragged and every kernel cache-unfriendly: on a 250,000-unknown P1 problem a random numbering took
/// 25 instead of 15 CG iterations and about four times the time. Numbering the dofs in this order restores both.
/// </remarks>
public static class DofOrdering
{
    /// <summary>
    /// Returns a new node→dof map with the same dofs (same merging, same −1 entries) renumbered in reverse
    /// Cuthill–McKee order of the dof adjacency graph that the elements induce.
    /// </summary>
    /// <param name="connectivity">Element nodes, <paramref name="nodesPerElement"/> per element.</param>
    /// <param name="nodesPerElement">k, e.g. 3 for linear triangles.</param>
    /// <param name="dofOfNode">Current dof of each node, or −1.</param>
    /// <param name="dofCount">Number of dofs.</param>
    public static int[] ReverseCuthillMcKee(int[] connectivity, int nodesPerElement, int[] dofOfNode, int dofCount)
    {
        var plan = CsrAssemblyPlan.Create(connectivity, nodesPerElement, dofOfNode, dofCount);
        var newOfOld = Order(dofCount, plan.PatternRowPointers, plan.PatternColumnIndices);
        var map = new int[dofOfNode.Length];
        for (int i = 0; i < map.Length; i++)
        {
            map[i] = dofOfNode[i] < 0 ? -1 : newOfOld[dofOfNode[i]];
        }
        return map;
    }

    /// <summary>
    /// Reverse Cuthill–McKee ordering of the graph of a square matrix's pattern (symmetrised by use: an entry
    /// (i, j) links i and j). Returns newIndex[oldIndex].
    /// </summary>
    public static int[] ReverseCuthillMcKee(CsrMatrix pattern)
    {
        ArgumentNullException.ThrowIfNull(pattern);
        if (pattern.Rows != pattern.Columns)
        {
            throw new ArgumentException($"Ordering needs a square pattern (got {pattern.Rows} x {pattern.Columns}).", nameof(pattern));
        }
        return Order(pattern.Rows, pattern.RowPointers, pattern.ColumnIndices);
    }

    private static int[] Order(int n, int[] rp, int[] ci)
    {
        var degree = new int[n];
        for (int i = 0; i < n; i++)
        {
            degree[i] = rp[i + 1] - rp[i];
        }
        var order = new int[n];      // Cuthill–McKee order, filled front to back
        var visited = new bool[n];
        var levelMark = new int[n];  // scratch for the pseudo-peripheral search
        int filled = 0;
        var neighbours = new List<int>();
        Comparison<int> byDegree = (a, b) => degree[a] != degree[b] ? degree[a].CompareTo(degree[b]) : a.CompareTo(b);
        for (int seed = 0; seed < n; seed++)
        {
            if (visited[seed])
            {
                continue;
            }
            int start = PseudoPeripheral(seed, rp, ci, degree, levelMark, order, filled);
            // Breadth-first search from start, neighbours by increasing degree.
            int head = filled;
            order[filled++] = start;
            visited[start] = true;
            while (head < filled)
            {
                int v = order[head++];
                neighbours.Clear();
                for (int k = rp[v]; k < rp[v + 1]; k++)
                {
                    int w = ci[k];
                    if (!visited[w])
                    {
                        visited[w] = true;
                        neighbours.Add(w);
                    }
                }
                neighbours.Sort(byDegree);
                foreach (int w in neighbours)
                {
                    order[filled++] = w;
                }
            }
        }
        var newOfOld = new int[n];
        for (int p = 0; p < n; p++)
        {
            newOfOld[order[p]] = n - 1 - p;
        }
        return newOfOld;
    }

    /// <summary>
    /// Finds a node of large eccentricity in the component of <paramref name="seed"/>: repeat a breadth-first
    /// search from the minimum-degree node of the deepest level while the depth grows. Uses
    /// <paramref name="queue"/> from <paramref name="queueStart"/> on as scratch (those slots are not yet used).
    /// </summary>
    private static int PseudoPeripheral(int seed, int[] rp, int[] ci, int[] degree, int[] levelMark, int[] queue, int queueStart)
    {
        int root = seed;
        int depth = -1;
        int stamp = seed + 1;
        // Two or three searches usually settle; four bounds the cost at 10⁶ nodes.
        for (int attempt = 0; attempt < 4; attempt++)
        {
            // BFS from root; levelMark holds a per-search stamp so no clearing is needed between searches.
            int mark = -(stamp * 16 + attempt + 1);
            int head = queueStart, tail = queueStart;
            queue[tail++] = root;
            levelMark[root] = mark;
            int levelStart = head, levelEnd = tail, levels = 0;
            int lastLevelStart = head, lastLevelEnd = tail;
            while (head < tail)
            {
                levelStart = head;
                levelEnd = tail;
                for (; head < levelEnd; head++)
                {
                    int v = queue[head];
                    for (int k = rp[v]; k < rp[v + 1]; k++)
                    {
                        int w = ci[k];
                        if (levelMark[w] != mark)
                        {
                            levelMark[w] = mark;
                            queue[tail++] = w;
                        }
                    }
                }
                lastLevelStart = levelStart;
                lastLevelEnd = levelEnd;
                levels++;
            }
            if (levels <= depth)
            {
                break;
            }
            depth = levels;
            int best = queue[lastLevelStart];
            for (int q = lastLevelStart; q < lastLevelEnd; q++)
            {
                if (degree[queue[q]] < degree[best])
                {
                    best = queue[q];
                }
            }
            if (best == root)
            {
                break;
            }
            root = best;
        }
        return root;
    }
}
