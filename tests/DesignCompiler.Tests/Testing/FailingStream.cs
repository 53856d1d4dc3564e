namespace DesignCompiler.Tests.Testing;

/// <summary>
/// A file stream that takes <paramref name="capacity"/> bytes and then fails every write with the
/// error a full disk gives (ENOSPC), half-way through a buffer, as a real disk fills.
/// </summary>
public sealed class FailingStream(string path, long capacity) : Stream
{
    private readonly FileStream _file = new(path, FileMode.Create, FileAccess.Write, FileShare.None);

    public override bool CanRead => false;
    public override bool CanSeek => false;
    public override bool CanWrite => true;
    public override long Length => _file.Length;
    public override long Position { get => _file.Position; set => throw new NotSupportedException(); }

    public override void Write(byte[] buffer, int offset, int count) => Write(buffer.AsSpan(offset, count));

    public override void Write(ReadOnlySpan<byte> buffer)
    {
        var room = (int)Math.Max(0, Math.Min(buffer.Length, capacity - _file.Position));
        _file.Write(buffer[..room]);
        _file.Flush();
        if (room < buffer.Length) throw new IOException("No space left on device : '" + path + "'", unchecked((int)0x8007001C));
    }

    public override void Flush() => _file.Flush();
    public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
    public override void SetLength(long value) => throw new NotSupportedException();

    protected override void Dispose(bool disposing)
    {
        if (disposing) _file.Dispose();
        base.Dispose(disposing);
    }
}
