namespace DesignCompiler.Results;

/// <summary>
/// The columns of the crew sheet, as the CSV template writes them
/// (<c>Templates/sheet.csv.sbn</c> in the rendering project); a returned sheet must keep them.
/// </summary>
public static class SheetColumns
{
    public const string Header = "round,block,plot,row,column,arm,label,outcome,notes";

    public const int Round = 0;
    public const int Block = 1;
    public const int Plot = 2;
    public const int Row = 3;
    public const int Column = 4;
    public const int Arm = 5;
    public const int Label = 6;
    public const int Outcome = 7;
    public const int Notes = 8;
    public const int Count = 9;

    public static string Name(int index) => Header.Split(',')[index];
}
