namespace WindScript.LanguageServer.Rpc;

/// <summary>The error codes of JSON-RPC 2.0 and the ones LSP 3.17 adds.</summary>
public static class RpcErrorCodes
{
    public const int ParseError = -32700;
    public const int InvalidRequest = -32600;
    public const int MethodNotFound = -32601;
    public const int InvalidParams = -32602;
    public const int InternalError = -32603;
    public const int ServerNotInitialized = -32002;
    public const int RequestFailed = -32803;
    public const int RequestCancelled = -32800;
}

/// <summary>Thrown by a handler to answer its request with a specific JSON-RPC error.</summary>
public sealed class RpcException(int code, string message) : Exception(message)
{
    public int Code { get; } = code;
}
